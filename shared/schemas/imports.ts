import { z } from 'zod';
import { CURVE_ROLES } from './wells';

/** Imports of well data files: the kinds, and the replies of POST /imports (preview and commit) and GET /imports. */
export const IMPORT_KINDS = ['wells', 'surveys', 'pressures', 'tops', 'las'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];

/** A problem, warning or note about a file, by its line (and the column, in the file's own header). */
export const importProblemSchema = z.object({ line: z.number(), column: z.string().optional(), message: z.string() });
export type ImportProblem = z.infer<typeof importProblemSchema>;

/** The latest earlier upload of the same bytes. */
export const duplicateOfSchema = z.object({ uploadId: z.string(), fileName: z.string(), createdAt: z.string() });
export type DuplicateOf = z.infer<typeof duplicateOfSchema>;

export const csvFactsSchema = z.object({
  delimiter: z.string(),
  decimalComma: z.boolean(),
  encoding: z.string(),
  columns: z.array(z.object({ name: z.string(), field: z.string().nullable(), unit: z.string().optional() })),
  units: z.record(z.string(), z.string()),
});
export type CsvFacts = z.infer<typeof csvFactsSchema>;

export const lasCurvePlanSchema = z.object({
  mnemonic: z.string(),
  unit: z.string(),
  description: z.string(),
  role: z.enum(CURVE_ROLES),
  suggestedRole: z.enum(CURVE_ROLES),
  samples: z.number(),
  validSamples: z.number(),
});
export type LasCurvePlan = z.infer<typeof lasCurvePlanSchema>;

export const lasFactsSchema = z.object({
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

/** Records read, invalid and valid, and per kind what a commit would do (create/update wells, curves, samples…). */
export const importCountsSchema = z.object({ records: z.number(), invalid: z.number(), valid: z.number() }).catchall(z.number());
export type ImportCounts = z.infer<typeof importCountsSchema>;

export const importSummarySchema = z.object({
  kind: z.enum(IMPORT_KINDS),
  fileName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  duplicateOf: duplicateOfSchema.nullable(),
  problems: z.array(importProblemSchema),
  warnings: z.array(importProblemSchema),
  notes: z.array(importProblemSchema),
  counts: importCountsSchema,
  invalidLines: z.array(z.number()),
  csv: csvFactsSchema.optional(),
  las: lasFactsSchema.optional(),
});
export type ImportSummary = z.infer<typeof importSummarySchema>;

/** A parsed, normalised record (SI units) of the preview, with the file line it came from. */
export const previewRowSchema = z.record(z.string(), z.unknown());
export type PreviewRow = z.infer<typeof previewRowSchema>;

export const importPreviewSchema = importSummarySchema.extend({
  dryRun: z.literal(true),
  preview: z.array(previewRowSchema),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** What a commit wrote; the upload record keeps the same object (without `uploadId`) as its outcome. */
export const importOutcomeSchema = z
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
export type ImportOutcome = z.infer<typeof importOutcomeSchema>;

export const importCommitSchema = importSummarySchema.extend({
  dryRun: z.literal(false),
  /** True when the same file was imported before and the person chose to skip it. */
  skipped: z.boolean(),
  outcome: importOutcomeSchema.optional(),
});
export type ImportCommit = z.infer<typeof importCommitSchema>;

/** One row of the team's upload history (GET /imports), newest first. */
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
