import { z, type ZodType } from 'zod';
import { IMPORT_KINDS, type ImportKind } from '@shared/schemas/imports';
import { CURVE_ROLES } from '@shared/schemas/wells';
import { api, ApiClientError, describeApiError, postMultipart, toFieldIssues } from './client';

// Reply shapes of POST /imports and friends. Kept here until the contract gains shared schemas for them
// (the server builds these objects in server/features/imports/imports.service.ts).

export const importProblemSchema = z.object({ line: z.number(), column: z.string().optional(), message: z.string() });
export type ImportProblem = z.infer<typeof importProblemSchema>;

const duplicateOfSchema = z.object({ uploadId: z.string(), fileName: z.string(), createdAt: z.string() });
export type DuplicateOf = z.infer<typeof duplicateOfSchema>;

const csvFactsSchema = z.object({
  delimiter: z.string(),
  decimalComma: z.boolean(),
  encoding: z.string(),
  columns: z.array(z.object({ name: z.string(), field: z.string().nullable(), unit: z.string().optional() })),
  units: z.record(z.string(), z.string()),
});
export type CsvFacts = z.infer<typeof csvFactsSchema>;

const lasCurvePlanSchema = z.object({
  mnemonic: z.string(),
  unit: z.string(),
  description: z.string(),
  role: z.enum(CURVE_ROLES),
  suggestedRole: z.enum(CURVE_ROLES),
  samples: z.number(),
  validSamples: z.number(),
});
export type LasCurvePlan = z.infer<typeof lasCurvePlanSchema>;

const lasFactsSchema = z.object({
  plan: z.object({
    well: z.object({ id: z.string(), name: z.string(), uwi: z.string().nullable() }).nullable(),
    wellLabel: z.string(),
    matchedBy: z.enum(['chosen', 'uwi', 'name']).nullable(),
    // The file gives X/Y but no LATI/LONG: only then does the EPSG code of X/Y matter.
    xyOnly: z.boolean().optional(),
    // Set when no well matches and the file's header places one: the commit creates it.
    createWell: z
      .object({ name: z.string(), uwi: z.string().nullable(), lon: z.number(), lat: z.number(), locationFrom: z.string() })
      .nullable()
      .optional(),
    indexUnit: z.string(),
    // NaN for a file without samples, which JSON carries as null.
    topMdM: z.number().nullable(),
    baseMdM: z.number().nullable(),
    curves: z.array(lasCurvePlanSchema),
  }),
  version: z.number().nullable(),
  wrap: z.string(),
});
export type LasFacts = z.infer<typeof lasFactsSchema>;

const countsSchema = z.object({ records: z.number(), invalid: z.number(), valid: z.number() }).catchall(z.number());
export type ImportCounts = z.infer<typeof countsSchema>;

const summaryShape = {
  kind: z.enum(IMPORT_KINDS),
  fileName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  duplicateOf: duplicateOfSchema.nullable(),
  problems: z.array(importProblemSchema),
  warnings: z.array(importProblemSchema),
  notes: z.array(importProblemSchema),
  counts: countsSchema,
  invalidLines: z.array(z.number()),
  csv: csvFactsSchema.optional(),
  las: lasFactsSchema.optional(),
};

/** A parsed, normalised record (SI units) of the preview, with the file line it came from. */
export type PreviewRow = Record<string, unknown>;

export const importPreviewSchema = z.object({
  ...summaryShape,
  dryRun: z.literal(true),
  preview: z.array(z.record(z.string(), z.unknown())),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

const outcomeSchema = z
  .object({
    uploadId: z.string(),
    created: z.number(),
    updated: z.number().optional(),
    skippedLines: z.array(z.number()),
    reimportOf: z.string().nullable().optional(),
    /** LAS: the well the curves went into (matched or created from the file). */
    wellId: z.string().optional(),
  })
  .catchall(z.unknown());
export type ImportOutcome = z.infer<typeof outcomeSchema>;

export const importCommitSchema = z.object({
  ...summaryShape,
  dryRun: z.literal(false),
  /** True when the same file was imported before and the person chose to skip it. */
  skipped: z.boolean(),
  outcome: outcomeSchema.optional(),
});
export type ImportCommit = z.infer<typeof importCommitSchema>;

export const importJobSchema = z.object({
  id: z.string(),
  state: z.enum(['running', 'done', 'error']),
  phase: z.string(),
  done: z.number(),
  total: z.number(),
  result: z.unknown().optional(),
  error: z.object({ status: z.number(), code: z.string(), message: z.string(), details: z.unknown().optional() }).optional(),
});
export type ImportJob = z.infer<typeof importJobSchema>;

export const uploadRecordSchema = z.object({
  id: z.string(),
  kind: z.enum(IMPORT_KINDS),
  fileName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  outcome: z.record(z.string(), z.unknown()).nullable(),
  uploadedBy: z.string().nullable(),
  createdAt: z.string(),
});
export type UploadRecord = z.infer<typeof uploadRecordSchema>;

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
 * Starts the commit as a server job; poll it with {@link getImportJob}.
 * @example const { jobId } = await startImportJob(teamId, { kind: 'wells', skipInvalid: true }, file);
 */
export function startImportJob(teamId: string, request: ImportRequest, file: File): Promise<{ jobId: string }> {
  return postForm(teamId, formOf(request, file, 'job'), z.object({ jobId: z.string() }));
}

/**
 * Where a commit job stands (phase, done/total), with its result or error when finished.
 * @example const job = await getImportJob(teamId, jobId); job.state // 'running'
 */
export function getImportJob(teamId: string, jobId: string): Promise<ImportJob> {
  return api.get(`${teamPath(teamId)}/imports/jobs/${encodeURIComponent(jobId)}`, importJobSchema);
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
