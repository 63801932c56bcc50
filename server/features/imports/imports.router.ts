import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { IMPORT_KINDS } from '../../../shared/schemas/imports';
import type { Db } from '../../db/client';
import { HttpError, badRequest } from '../../lib/httpError';
import { parse } from '../../lib/parse';
import type { TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import type { JobRegistry } from '../../lib/jobs';
import { MAX_FILE_BYTES, getUploadFile, listUploads, runImport } from './imports.service';

const jsonField = (what: string) =>
  z
    .string()
    .optional()
    .transform((s, ctx) => {
      if (s === undefined || s === '') return undefined;
      try {
        const v = JSON.parse(s);
        if (v && typeof v === 'object' && !Array.isArray(v)) return v as Record<string, string | null>;
      } catch {
        /* reported below */
      }
      ctx.addIssue({ code: 'custom', message: `must be a JSON object of ${what}` });
      return z.NEVER;
    });

const bool = z
  .enum(['true', 'false'])
  .optional()
  .transform((v) => v === 'true');

const importForm = z.object({
  kind: z.enum(IMPORT_KINDS, `must be one of ${IMPORT_KINDS.join(', ')}`),
  mapping: jsonField('column → field (or LAS mnemonic → curve role)'),
  units: jsonField('field → unit'),
  epsg: z.coerce.number().int().min(1024).max(999999).default(4326),
  wellId: z.string().uuid('must be a well id').optional(),
  dryRun: bool,
  skipInvalid: bool,
  async: bool,
  onDuplicate: z.enum(['update', 'skip']).optional(),
});

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_FILE_BYTES, files: 1, fields: 20, fieldSize: 1024 * 1024 },
});

/** multer's own errors become the API's error shape, naming the limit. */
const receiveFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (err: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(new HttpError(413, 'file_too_large', `The file is larger than the ${MAX_FILE_BYTES / 1024 / 1024} MB limit.`));
      return next(badRequest('bad_upload', `The upload is not acceptable: ${err.message}${err.field ? ` (${err.field})` : ''}.`));
    }
    next(err);
  });
};

export function importsRouter(db: Db, changes: TeamChanges, jobs: JobRegistry): Router {
  const r = Router({ mergeParams: true });

  r.post('/:teamId/imports', requireTeam('wells.import'), receiveFile, async (req, res) => {
    const form = parse(importForm, req.body ?? {});
    if (!req.file)
      throw badRequest('validation_failed', 'Attach the file to import in the "file" field.', [{ path: 'file', message: 'is required' }]);
    const request = {
      teamId: teamIdOf(req),
      userId: req.session!.user.id,
      kind: form.kind,
      fileName: req.file.originalname || 'upload',
      bytes: req.file.buffer,
      mapping: form.mapping,
      units: form.units as Record<string, string> | undefined,
      epsg: form.epsg,
      wellId: form.wellId,
      dryRun: form.dryRun,
      skipInvalid: form.skipInvalid,
      onDuplicate: form.onDuplicate,
    };
    if (form.async) {
      const job = jobs.start(request.teamId, 'import', async (progress) => {
        const result = await runImport(db, request, progress);
        if (!form.dryRun) changes.bump(request.teamId);
        return result;
      });
      res.status(202).json({ jobId: job.id });
      return;
    }
    const result = await runImport(db, request);
    if (!form.dryRun) changes.bump(request.teamId);
    res.status(form.dryRun ? 200 : 201).json(result);
  });

  r.get('/:teamId/imports', requireTeam('team.read'), async (req, res) => {
    res.json(await listUploads(db, teamIdOf(req)));
  });

  r.get('/:teamId/imports/:uploadId/file', requireTeam('team.read'), async (req, res) => {
    const { uploadId } = parse(z.object({ uploadId: z.string().uuid('must be an upload id') }), req.params);
    const file = await getUploadFile(db, teamIdOf(req), uploadId);
    res.setHeader('Content-Type', 'application/octet-stream');
    res.setHeader('Content-Disposition', `attachment; filename="${file.fileName.replace(/["\\\r\n]/g, '_')}"`);
    res.send(file.content);
  });
  return r;
}
