import { z, type ZodType } from 'zod';
import {
  duplicateOfSchema,
  importPreviewSchema,
  importProblemSchema,
  uploadRecordSchema,
  type DuplicateOf,
  type ImportKind,
  type ImportPreview,
  type ImportProblem,
  type UploadRecord,
} from '@shared/schemas/imports';
import { jobStartedSchema, type JobStarted } from '@shared/schemas/jobs';
import { api, ApiClientError, describeApiError, postMultipart, toFieldIssues } from './client';

/** What the person chose on the Import page, before it becomes multipart fields. */
export interface ImportRequest {
  kind: ImportKind;
  /** CSV: column → field key (null ignores the column); LAS: mnemonic → curve role. Absent: the server suggests. */
  mapping?: Record<string, string | null>;
  /** Field key → unit of its column. */
  units?: Record<string, string>;
  /** EPSG code of well x/y; the server assumes 4326 (lon/lat) without it. */
  epsg?: number;
  /** LAS: attach the curves to this well instead of matching by UWI or name. */
  wellId?: string;
  skipInvalid?: boolean;
  onDuplicate?: 'update' | 'skip';
}

/**
 * The text fields of `POST /imports` for a preview (`dryRun`) or a commit run as a job (`async`),
 * in the form the server's multer + zod form parser reads them.
 * @example importFormEntries({ kind: 'wells', epsg: 32631 }, 'preview')
 * // [['kind', 'wells'], ['epsg', '32631'], ['dryRun', 'true']]
 */
export function importFormEntries(request: ImportRequest, mode: 'preview' | 'job'): [string, string][] {
  const entries: [string, string][] = [['kind', request.kind]];
  if (request.mapping && Object.keys(request.mapping).length > 0) entries.push(['mapping', JSON.stringify(request.mapping)]);
  if (request.units && Object.keys(request.units).length > 0) entries.push(['units', JSON.stringify(request.units)]);
  if (request.epsg !== undefined && request.epsg !== 4326) entries.push(['epsg', String(request.epsg)]);
  if (request.wellId) entries.push(['wellId', request.wellId]);
  if (mode === 'preview') {
    entries.push(['dryRun', 'true']);
  } else {
    entries.push(['async', 'true']);
    if (request.skipInvalid) entries.push(['skipInvalid', 'true']);
    if (request.onDuplicate) entries.push(['onDuplicate', request.onDuplicate]);
  }
  return entries;
}

/** An import the server refused, with the problems (422) or the earlier upload of the same file (409) when it sent them. */
export class ImportRejectedError extends ApiClientError {
  constructor(
    status: number,
    code: string,
    message: string,
    readonly problems: ImportProblem[] = [],
    readonly duplicateOf: DuplicateOf | null = null,
  ) {
    super(status, code, message, []);
  }
}

/**
 * The error for a refusal, keeping the structured details the generic client drops (they are not field issues).
 * @example importError(422, 'import_has_problems', 'x.csv: 1 problem(s) found', [{ line: 3, message: '…' }]).problems.length // 1
 */
export function importError(status: number, code: string, message: string, details: unknown): ImportRejectedError {
  const problems = z.array(importProblemSchema).safeParse(details);
  const duplicate = z.object({ duplicateOf: duplicateOfSchema }).safeParse(details);
  const text = describeApiError(message, toFieldIssues(details));
  return new ImportRejectedError(
    status,
    code,
    text,
    problems.success ? problems.data : [],
    duplicate.success ? duplicate.data.duplicateOf : null,
  );
}

const teamPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}`;

/** A multipart POST of an import (preview or job), with the import's own error that carries line problems. */
function postForm<T>(teamId: string, form: FormData, schema: ZodType<T>): Promise<T> {
  return postMultipart(`${teamPath(teamId)}/imports`, form, {
    schema,
    bareFailure: (status) => (status === 413 ? 'The file is too large to import.' : `The upload failed (HTTP ${status}).`),
    toError: importError,
  });
}

function formOf(request: ImportRequest, file: File, mode: 'preview' | 'job'): FormData {
  const form = new FormData();
  for (const [name, value] of importFormEntries(request, mode)) form.append(name, value);
  form.append('file', file, file.name);
  return form;
}

/**
 * Reads and checks the whole file without writing anything: detected format, suggested mapping,
 * problems by line, counts and the first 50 normalised rows.
 * @example const preview = await previewImport(teamId, { kind: 'wells' }, file); preview.counts.valid // 3
 */
export function previewImport(teamId: string, request: ImportRequest, file: File): Promise<ImportPreview> {
  return postForm(teamId, formOf(request, file, 'preview'), importPreviewSchema);
}

/**
 * Starts the commit as a server job; poll it with `getJob(teamId, jobId, 'import')` (./jobs).
 * @example const { jobId } = await startImportJob(teamId, { kind: 'wells', skipInvalid: true }, file);
 */
export function startImportJob(teamId: string, request: ImportRequest, file: File): Promise<JobStarted> {
  return postForm(teamId, formOf(request, file, 'job'), jobStartedSchema);
}

/**
 * The team's upload history, newest first.
 * @example const uploads = await listUploads(teamId);
 */
export function listUploads(teamId: string): Promise<UploadRecord[]> {
  return api.get(`${teamPath(teamId)}/imports`, z.array(uploadRecordSchema));
}

/**
 * Link that downloads the original file of an upload (same origin, the session cookie rides along).
 * @example uploadFileUrl(teamId, uploadId) // '/api/teams/…/imports/…/file'
 */
export function uploadFileUrl(teamId: string, uploadId: string): string {
  return `${teamPath(teamId)}/imports/${encodeURIComponent(uploadId)}/file`;
}
