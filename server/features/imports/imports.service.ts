import { createHash } from 'node:crypto';
import { and, desc, eq, sql } from 'drizzle-orm';
import { decodeText } from '../../../shared/formats/decodeText';
import { parseCsv, suggestColumnMatches } from '../../../shared/formats/csv';
import { parseLas, type LasFile } from '../../../shared/formats/las';
import type { Problem } from '../../../shared/formats/problem';
import { IMPORT_FIELDS, UNITS_FOR_QUANTITY, type CsvImportKind } from '../../../shared/imports/fields';
import { mapCsvRows, type ColumnMapping, type FieldUnits } from '../../../shared/imports/mapRows';
import type {
  CsvFacts,
  ImportCommit,
  ImportKind,
  ImportOutcome,
  ImportPreview,
  ImportSummary,
  PreviewRow,
  UploadRecord,
} from '../../../shared/schemas/imports';
import type { Db } from '../../db/client';
import { uploads, wells } from '../../db/schema';
import { HttpError, badRequest, conflict, notFound } from '../../lib/httpError';
import { planPressures, planSurveys, planTops, planWells } from './csvPlans';
import type { Progress } from '../../lib/jobs';
import { removeRowsOfUploads, writeLasCurves, writePressures, writeSurveys, writeTops, writeWells } from './importWriter';
import { NEIGHBOUR_RADIUS_M, newWellGapsNote, planLas, settleOffshore, type LasPlan } from './lasPlan';
import { loadSurveys } from '../wells/surveys';
import { WellLookup } from './wellLookup';

export const MAX_FILE_BYTES = 50 * 1024 * 1024;
export const MAX_ROWS = 500_000;
const PREVIEW_ROWS = 50;

export interface ImportRequest {
  teamId: string;
  userId: string;
  kind: ImportKind;
  fileName: string;
  bytes: Buffer;
  mapping?: ColumnMapping;
  units?: FieldUnits;
  epsg: number;
  /** LAS only: attach to this well instead of matching by UWI/name. */
  wellId?: string;
  dryRun: boolean;
  skipInvalid: boolean;
  onDuplicate?: 'update' | 'skip';
}

interface Planned {
  problems: Problem[];
  warnings: Problem[];
  notes: Problem[];
  totalRecords: number;
  invalidLines: number[];
  preview: PreviewRow[];
  /** The kind's own counts beside `valid` (create/update, wells, curves…); records and invalid are added last. */
  counts: { valid: number } & Record<string, number>;
  csv?: CsvFacts & { units: FieldUnits };
  las?: { plan: LasPlan; version: number | null; wrap: string };
  write: (
    tx: Parameters<Parameters<Db['transaction']>[0]>[0],
    uploadId: string,
    progress: Progress,
  ) => Promise<{ created: number } & Record<string, unknown>>;
}

function sha256(bytes: Buffer) {
  return createHash('sha256').update(bytes).digest('hex');
}

/** Reads and checks the whole file against the team's data; writes nothing. */
async function plan(db: Db, req: ImportRequest, progress: Progress): Promise<Planned> {
  progress('reading file', 0, 1);
  let text: string;
  let encoding: string;
  try {
    ({ text, encoding } = decodeText(req.bytes));
  } catch (err) {
    throw badRequest('unreadable_file', `${req.fileName}: ${(err as Error).message}`);
  }
  if (text.trim() === '') throw badRequest('empty_file', `${req.fileName} is empty.`);
  const lookup = await WellLookup.load(db, req.teamId);
  if (req.kind === 'las') return planLasFile(db, req, parseLas(text), lookup);

  const kind: CsvImportKind = req.kind;
  const csv = parseCsv(text);
  if (csv.rows.length > MAX_ROWS) {
    throw new HttpError(
      413,
      'too_many_rows',
      `${req.fileName} has ${csv.rows.length.toLocaleString('en')} rows; the limit is ${MAX_ROWS.toLocaleString('en')} per file — split it.`,
    );
  }
  if (csv.header.length === 0 || (csv.rows.length === 0 && csv.problems.length === 0))
    throw badRequest('empty_file', `${req.fileName} has no data rows under its header.`);
  const fields = IMPORT_FIELDS[kind];
  const matches = suggestColumnMatches(csv.header, fields);
  const mapping: ColumnMapping = req.mapping ?? Object.fromEntries(matches.map((m) => [m.column, m.field]));
  // Units: as chosen, else as the header says (when it names an offered unit), else the default.
  const units: FieldUnits = {};
  for (const f of fields) {
    if (!f.quantity) continue;
    const column = Object.entries(mapping).find(([, k]) => k === f.key)?.[0];
    const fromHeader = matches.find((m) => m.column === column)?.unit;
    const offered = UNITS_FOR_QUANTITY[f.quantity];
    const headerUnit = fromHeader ? offered.find((u) => u.toLowerCase() === fromHeader.toLowerCase().replace('°', 'deg')) : undefined;
    units[f.key] = req.units?.[f.key] ?? headerUnit ?? offered[0];
  }
  progress('checking rows', 0, csv.rows.length);
  const mapped = mapCsvRows(csv, kind, mapping, units);
  const problems = [...csv.problems, ...mapped.problems];
  // A unit for a field that has none would otherwise be dropped without a word.
  const numeric = fields.filter((f) => f.quantity).map((f) => f.key);
  for (const key of Object.keys(req.units ?? {})) {
    if (!numeric.includes(key))
      problems.push({
        line: 1,
        column: key,
        message: `a unit was chosen for "${key}", which is not a numeric field of a ${kind} import (${numeric.join(', ')})`,
      });
  }
  // Ragged records never reach the mapping, but they are skipped lines all the same.
  const invalidLines = [...csv.raggedLines, ...mapped.rejected.map((r) => r.line)];
  // The planners speak of fields ('x', 'md'); the user knows the columns by the file's own header.
  const inFileTerms = (list: Problem[]) =>
    list.map((x) => (x.column && mapped.columnOfField[x.column] ? { ...x, column: mapped.columnOfField[x.column] } : x));
  const columns = csv.header.map((name) => ({
    name,
    field: mapping[name] ?? null,
    ...(matches.find((m) => m.column === name)?.unit ? { unit: matches.find((m) => m.column === name)!.unit } : {}),
  }));
  const base = {
    warnings: [] as Problem[],
    notes: [] as Problem[],
    totalRecords: csv.rows.length + csv.raggedLines.length,
    csv: { delimiter: csv.delimiter, decimalComma: csv.decimalComma, encoding, columns, units },
  };
  const needsSurveys = kind === 'pressures' || kind === 'tops';
  const surveys = needsSurveys
    ? await loadSurveys(db, [...new Set(mapped.records.map((r) => lookup.find(String(r.values.well))?.id).filter((x): x is string => !!x))])
    : new Map();

  if (kind === 'wells') {
    const p = planWells(mapped.records, lookup, req.epsg, mapped.rejected);
    return {
      ...base,
      problems: [...problems, ...inFileTerms(p.problems)],
      invalidLines: [...invalidLines, ...p.invalidLines],
      preview: p.rows.slice(0, PREVIEW_ROWS).map((r) => ({ ...r, action: r.existingId ? 'update' : 'create' })),
      counts: {
        valid: p.rows.length,
        create: p.rows.filter((r) => !r.existingId).length,
        update: p.rows.filter((r) => r.existingId).length,
      },
      write: (tx, uploadId, pr) => writeWells(tx, req.teamId, req.userId, uploadId, p.rows, pr),
    };
  }
  if (kind === 'surveys') {
    const p = planSurveys(mapped.records, lookup);
    const stations = p.rows.reduce((n, s) => n + s.stations.length, 0);
    return {
      ...base,
      problems: [...problems, ...inFileTerms(p.problems)],
      invalidLines: [...invalidLines, ...p.invalidLines],
      preview: p.rows.flatMap((s) => s.stations.map((st, i) => ({ line: s.lines[i], well: s.wellName, ...st }))).slice(0, PREVIEW_ROWS),
      counts: { valid: stations, wells: p.rows.length },
      write: (tx, uploadId, pr) => writeSurveys(tx, uploadId, p.rows, pr),
    };
  }
  if (kind === 'pressures') {
    const p = planPressures(mapped.records, lookup, surveys);
    return {
      ...base,
      warnings: inFileTerms(p.warnings ?? []),
      problems: [...problems, ...inFileTerms(p.problems)],
      invalidLines: [...invalidLines, ...p.invalidLines],
      preview: p.rows.slice(0, PREVIEW_ROWS).map(({ wellId: _id, ...r }) => r),
      counts: { valid: p.rows.length },
      write: (tx, uploadId, pr) => writePressures(tx, uploadId, p.rows, pr),
    };
  }
  const p = planTops(mapped.records, lookup, surveys);
  return {
    ...base,
    warnings: inFileTerms(p.warnings ?? []),
    problems: [...problems, ...inFileTerms(p.problems)],
    invalidLines: [...invalidLines, ...p.invalidLines],
    preview: p.rows.slice(0, PREVIEW_ROWS).map(({ wellId: _id, ...r }) => r),
    counts: { valid: p.rows.length },
    write: (tx, uploadId, pr) => writeTops(tx, uploadId, p.rows, pr),
  };
}

async function planLasFile(db: Db, req: ImportRequest, las: LasFile, lookup: WellLookup): Promise<Planned> {
  let chosen = null;
  if (req.wellId) {
    const [w] = await db
      .select({ id: wells.id, name: wells.name, uwi: wells.uwi, tdMdM: wells.tdMdM })
      .from(wells)
      .where(and(eq(wells.teamId, req.teamId), eq(wells.id, req.wellId)));
    if (!w)
      throw badRequest('validation_failed', 'The chosen well is not in this team.', [
        { path: 'wellId', message: 'is not a well of this team' },
      ]);
    chosen = w;
  }
  const roles = Object.fromEntries(Object.entries(req.mapping ?? {}).filter((e): e is [string, string] => typeof e[1] === 'string'));
  const { plan: p, problems, notes } = planLas(las, lookup, chosen, roles, req.epsg);
  if (p.createWell) {
    settleOffshore(p.createWell, await nearestTeamWell(db, req.teamId, p.createWell.lon, p.createWell.lat));
    notes.push(newWellGapsNote(las, p.createWell));
  }
  return {
    problems,
    warnings: las.warnings,
    notes: [...notes, ...las.notes],
    totalRecords: las.index.values.length,
    // A LAS file imports whole or not at all: a broken file has no "valid rows" to keep.
    invalidLines: problems.map((x) => x.line),
    preview: p.curves.map((c) => ({ ...c })),
    counts: {
      valid: problems.length ? 0 : p.curves.length,
      curves: p.curves.length,
      samples: las.index.values.length,
      createWell: p.createWell ? 1 : 0,
    },
    las: { plan: p, version: las.version, wrap: las.wrap },
    write: (tx, uploadId, pr) => writeLasCurves(tx, req.teamId, req.userId, uploadId, las, p, pr),
  };
}

/** The team's nearest well within the neighbour radius (on the spheroid), for settings a LAS file does not give. */
async function nearestTeamWell(db: Db, teamId: string, lon: number, lat: number) {
  const here = sql`ST_SetSRID(ST_MakePoint(${lon}, ${lat}), 4326)::geography`;
  const [row] = await db
    .select({ name: wells.name, offshore: wells.offshore, distanceM: sql<number>`ST_Distance(${wells.location}::geography, ${here})` })
    .from(wells)
    .where(and(eq(wells.teamId, teamId), sql`ST_DWithin(${wells.location}::geography, ${here}, ${NEIGHBOUR_RADIUS_M})`))
    .orderBy(sql`${wells.location}::geography <-> ${here}`)
    .limit(1);
  return row ? { ...row, distanceM: Number(row.distanceM) } : null;
}

/** The latest earlier upload of the same bytes, and the ids of every earlier upload of them. */
async function findDuplicate(db: Db, teamId: string, hash: string) {
  const earlier = await db
    .select({ uploadId: uploads.id, fileName: uploads.fileName, createdAt: uploads.createdAt })
    .from(uploads)
    .where(and(eq(uploads.teamId, teamId), eq(uploads.sha256, hash)))
    .orderBy(desc(uploads.createdAt));
  const [dup] = earlier;
  return dup ? { ...dup, createdAt: dup.createdAt.toISOString(), allUploadIds: earlier.map((u) => u.uploadId) } : null;
}

/**
 * Preview (dryRun) or commit one file. A commit runs in one transaction: with any problem nothing is
 * written, unless `skipInvalid` was chosen, in which case the skipped lines are kept in the upload record.
 */
export async function runImport(db: Db, req: ImportRequest, progress: Progress = () => {}): Promise<ImportPreview | ImportCommit> {
  const hash = sha256(req.bytes);
  const planned = await plan(db, req, progress);
  const duplicate = await findDuplicate(db, req.teamId, hash);
  const duplicateOf = duplicate && { uploadId: duplicate.uploadId, fileName: duplicate.fileName, createdAt: duplicate.createdAt };
  const invalidLines = [...new Set(planned.invalidLines)].sort((a, b) => a - b);
  // In the order a person reads the file (stable, so one line's problems keep their order).
  planned.problems = planned.problems
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.line - b.p.line || a.i - b.i)
    .map(({ p }) => p);
  const summary: ImportSummary = {
    kind: req.kind,
    fileName: req.fileName,
    sizeBytes: req.bytes.length,
    sha256: hash,
    duplicateOf,
    problems: planned.problems,
    warnings: planned.warnings,
    notes: planned.notes,
    counts: { records: planned.totalRecords, invalid: invalidLines.length, ...planned.counts },
    invalidLines: invalidLines.slice(0, 1000),
    csv: planned.csv,
    las: planned.las && { ...planned.las, plan: { ...planned.las.plan } },
  };
  if (req.dryRun) return { dryRun: true, ...summary, preview: planned.preview } satisfies ImportPreview;

  // Skipping bad rows is no help when nothing valid remains, and a LAS file is one record.
  const fatal = req.kind === 'las' || planned.counts.valid === 0;
  if (planned.problems.length && (!req.skipInvalid || fatal)) {
    throw new HttpError(
      422,
      'import_has_problems',
      `${req.fileName}: ${planned.problems.length} problem(s) found; nothing was imported.`,
      planned.problems,
    );
  }
  if (duplicateOf && !req.onDuplicate) {
    throw conflict(
      `${req.fileName} was imported before (as "${duplicateOf.fileName}" on ${duplicateOf.createdAt.slice(0, 10)}): choose to update from it again or skip.`,
      { duplicateOf },
    );
  }
  if (duplicateOf && req.onDuplicate === 'skip') return { dryRun: false, skipped: true, ...summary } satisfies ImportCommit;

  const outcome = await db.transaction(async (tx): Promise<ImportOutcome> => {
    const [upload] = await tx
      .insert(uploads)
      .values({
        teamId: req.teamId,
        kind: req.kind,
        fileName: req.fileName,
        sizeBytes: req.bytes.length,
        sha256: hash,
        content: req.bytes,
        outcome: {},
        mapping: {
          mapping: req.mapping ?? planned.csv?.columns ?? null,
          units: planned.csv?.units ?? null,
          epsg: req.epsg,
          wellId: req.wellId ?? null,
        },
        uploadedBy: req.userId,
      })
      .returning({ id: uploads.id });
    // "Update" means the file's rows replace what its earlier uploads wrote, in this same transaction.
    const replaced = duplicate && req.onDuplicate === 'update' ? await removeRowsOfUploads(tx, duplicate.allUploadIds) : 0;
    const written = await planned.write(tx, upload.id, progress);
    const result = {
      ...written,
      replaced,
      skippedLines: invalidLines,
      skippedProblems: planned.problems.slice(0, 1000),
      reimportOf: duplicateOf?.uploadId ?? null,
    };
    await tx.update(uploads).set({ outcome: result }).where(eq(uploads.id, upload.id));
    return { uploadId: upload.id, ...result };
  });
  return { dryRun: false, skipped: false, ...summary, outcome } satisfies ImportCommit;
}

export async function listUploads(db: Db, teamId: string, limit = 100): Promise<UploadRecord[]> {
  const rows = await db
    .select({
      id: uploads.id,
      kind: uploads.kind,
      fileName: uploads.fileName,
      sizeBytes: uploads.sizeBytes,
      sha256: uploads.sha256,
      outcome: uploads.outcome,
      uploadedBy: uploads.uploadedBy,
      createdAt: uploads.createdAt,
    })
    .from(uploads)
    .where(eq(uploads.teamId, teamId))
    .orderBy(desc(uploads.createdAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

export async function getUploadFile(db: Db, teamId: string, uploadId: string) {
  const [row] = await db
    .select({ fileName: uploads.fileName, content: uploads.content, kind: uploads.kind, mapping: uploads.mapping })
    .from(uploads)
    .where(and(eq(uploads.teamId, teamId), eq(uploads.id, uploadId)));
  if (!row) throw notFound('That upload');
  return row;
}
