import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { REFERENCE_LAYER_KINDS } from '../../../shared/schemas/planning';
import type { Db } from '../../db/client';
import { HttpError, badRequest } from '../../lib/httpError';
import { parse } from '../../lib/parse';
import type { TeamChanges } from '../../lib/teamChanges';
import { requireTeam, teamIdOf } from '../../middleware/guards';
import { createLayer, deleteLayer, listLayers } from './layers.service';
import { MAX_LAYER_BYTES } from './readLayerFile';

const form = z.object({
  name: z.string().trim().min(1, 'is required').max(120),
  kind: z.enum(REFERENCE_LAYER_KINDS).default('other'),
  color: z
    .string()
    .regex(/^#[0-9a-fA-F]{6}$/, 'must be a colour like #3a7bd5')
    .default('#6b7f99'),
});

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_LAYER_BYTES, files: 1 } });
const receive: RequestHandler = (req, res, next) =>
  upload.single('file')(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE')
      return next(new HttpError(413, 'file_too_large', `The layer file is larger than the ${MAX_LAYER_BYTES / 1024 / 1024} MB limit.`));
    next(err);
  });

export function layersRouter(db: Db, changes: TeamChanges): Router {
  const r = Router({ mergeParams: true });
  r.get('/:teamId/layers', requireTeam('team.read'), async (req, res) => {
    res.json(await listLayers(db, teamIdOf(req)));
  });
  r.post('/:teamId/layers', requireTeam('layers.upload'), receive, async (req, res) => {
    const body = parse(form, req.body ?? {});
    if (!req.file)
      throw badRequest('validation_failed', 'Attach the layer file in the "file" field.', [{ path: 'file', message: 'is required' }]);
    const layer = await createLayer(db, {
      teamId: teamIdOf(req),
      userId: req.session!.user.id,
      ...body,
      fileName: req.file.originalname,
      bytes: req.file.buffer,
    });
    changes.bump(teamIdOf(req));
    res.status(201).json(layer);
  });
  r.delete('/:teamId/layers/:id', requireTeam('layers.upload'), async (req, res) => {
    await deleteLayer(db, teamIdOf(req), parse(z.object({ id: z.string().uuid() }), req.params).id);
    changes.bump(teamIdOf(req));
    res.status(204).end();
  });
  return r;
}
