import { formatProblem } from '@shared/formats/problem';
import { IMPORT_FIELDS, UNITS_FOR_QUANTITY, type CsvImportKind, type ImportField } from '@shared/imports/fields';
import type { ImportKind } from '@shared/schemas/imports';
import type { CsvFacts, ImportPreview, ImportProblem, PreviewRow } from '@shared/schemas/imports';
import type { ImportRequest } from '@/api/imports';

export const IMPORT_KIND_LABELS: Record<ImportKind, string> = {
  wells: 'Well headers',
  surveys: 'Deviation surveys',
  pressures: 'Pressure observations',
  tops: 'Formation tops',
  las: 'LAS log file',
};

/** One line per kind on what the file should hold. */
export const IMPORT_KIND_HINTS: Record<ImportKind, string> = {
  wells: 'CSV with one well per row: name and surface location, optionally UWI, datum, water depth, TD.',
  surveys: 'CSV with one station per row: well, MD, inclination and azimuth. Replaces the well’s survey.',
  pressures: 'CSV of tests, kicks, losses, mud weights, LOT/FIT: well, kind, MD, value and its unit.',
  tops: 'CSV with one top per row: well, top name and MD (TVD optional, else from the survey).',
  las: 'One LAS 2.0 file: its curves attach to a well of this team, matched by UWI or name.',
};

/** Which files the picker offers first; any text file may still be dropped. */
export const IMPORT_ACCEPT: Record<ImportKind, string> = {
  wells: '.csv,.txt,.tsv',
  surveys: '.csv,.txt,.tsv',
  pressures: '.csv,.txt,.tsv',
  tops: '.csv,.txt,.tsv',
  las: '.las,.LAS,.txt',
};

/** CSV column → field key, or null to ignore the column. */
export type ColumnMapping = Record<string, string | null>;

export const isCsvKind = (kind: ImportKind): kind is CsvImportKind => kind !== 'las';

/**
 * The mapping the server used (suggested from the headers, or as sent), in file column order.
 * @example mappingFromCsv({ columns: [{ name: 'Well Name', field: 'name' }, { name: 'Remark', field: null }], … })
 * // { 'Well Name': 'name', Remark: null }
 */
export function mappingFromCsv(csv: Pick<CsvFacts, 'columns'>): ColumnMapping {
  return Object.fromEntries(csv.columns.map((c) => [c.name, c.field]));
}

/**
 * Maps `column` to `field` (null: ignore). A field can come from one column only, so a column that held
 * the field before is set to ignore rather than left to clash.
 * @example assignField({ A: 'md', B: null }, 'B', 'md') // { A: null, B: 'md' }
 */
export function assignField(mapping: ColumnMapping, column: string, field: string | null): ColumnMapping {
  const next: ColumnMapping = {};
  for (const [c, f] of Object.entries(mapping)) next[c] = field !== null && c !== column && f === field ? null : f;
  next[column] = field;
  return next;
}

/**
 * Required fields of a kind that no column maps to yet.
 * @example missingRequired('surveys', { well: 'well', md: 'md' }).map((f) => f.key) // ['inc', 'azi']
 */
export function missingRequired(kind: CsvImportKind, mapping: ColumnMapping): ImportField[] {
  const mapped = new Set(Object.values(mapping));
  return IMPORT_FIELDS[kind].filter((f) => f.required && !mapped.has(f.key));
}

/**
 * The field a key names in a kind, if any.
 * @example fieldOf('wells', 'waterDepth')?.quantity // 'depth'
 */
export function fieldOf(kind: CsvImportKind, key: string | null | undefined): ImportField | undefined {
  return key ? IMPORT_FIELDS[kind].find((f) => f.key === key) : undefined;
}

/**
 * Units offered for a mapped column, or null when its field has no unit (text, dates, angles in degrees only).
 * @example unitChoices('wells', 'waterDepth') // ['m', 'ft']
 */
export function unitChoices(kind: CsvImportKind, key: string | null): readonly string[] | null {
  const field = fieldOf(kind, key);
  if (!field?.quantity) return null;
  const offered = UNITS_FOR_QUANTITY[field.quantity];
  return offered.length > 1 ? offered : null;
}

/**
 * Units to send: one per mapped field that has a quantity, the chosen unit or else the first offered.
 * @example requestUnits('wells', { 'WD (ft)': 'waterDepth', Name: 'name' }, { waterDepth: 'ft', tdMd: 'm' }) // { waterDepth: 'ft' }
 */
export function requestUnits(kind: CsvImportKind, mapping: ColumnMapping, units: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of Object.values(mapping)) {
    const field = fieldOf(kind, key);
    if (field?.quantity) out[field.key] = units[field.key] ?? UNITS_FOR_QUANTITY[field.quantity][0];
  }
  return out;
}

/** What the Import page holds besides the file. */
export interface ImportChoices {
  kind: ImportKind;
  /** null until the first preview: the server suggests a mapping from the headers. */
  mapping: ColumnMapping | null;
  units: Record<string, string>;
  epsg: number;
  wellId: string | null;
  /** LAS mnemonic → curve role. */
  curveRoles: Record<string, string>;
}

/**
 * The request for the current choices; nothing the server would guess better is sent.
 * @example importRequest({ kind: 'wells', mapping: null, units: {}, epsg: 32631, wellId: null, curveRoles: {} })
 * // { kind: 'wells', epsg: 32631 }
 */
export function importRequest(choices: ImportChoices): ImportRequest {
  const { kind } = choices;
  if (!isCsvKind(kind)) {
    const request: ImportRequest = { kind };
    if (Object.keys(choices.curveRoles).length > 0) request.mapping = { ...choices.curveRoles };
    if (choices.wellId) request.wellId = choices.wellId;
    // The CRS of the file's X/Y, needed only to create a well from a LAS header without LATI/LONG.
    if (choices.epsg !== 4326) request.epsg = choices.epsg;
    return request;
  }
  const request: ImportRequest = { kind };
  if (choices.mapping) {
    request.mapping = { ...choices.mapping };
    request.units = requestUnits(kind, choices.mapping, choices.units);
  }
  if (kind === 'wells') request.epsg = choices.epsg;
  return request;
}

/**
 * Problems grouped by the file line they point at, each group in the server's order.
 * @example problemsByLine([{ line: 4, message: 'a' }, { line: 2, message: 'b' }, { line: 4, message: 'c' }]).get(4)?.length // 2
 */
export function problemsByLine(problems: readonly ImportProblem[]): Map<number, ImportProblem[]> {
  const byLine = new Map<number, ImportProblem[]>();
  for (const p of problems) {
    const list = byLine.get(p.line);
    if (list) list.push(p);
    else byLine.set(p.line, [p]);
  }
  return byLine;
}

/**
 * The column of a problem as the file names it. Cell problems carry the file's header; checks made after
 * reading (coordinates, duplicates) carry the field key, which is turned back into its column here.
 * @example problemColumn({ line: 4, column: 'x', message: '…' }, [{ name: 'Longitude', field: 'x' }]) // 'Longitude'
 */
export function problemColumn(problem: ImportProblem, columns: readonly { name: string; field: string | null }[]): string | undefined {
  if (problem.column === undefined) return undefined;
  if (columns.some((c) => c.name === problem.column)) return problem.column;
  return columns.find((c) => c.field === problem.column)?.name ?? problem.column;
}

/**
 * The problem as one sentence with its line and the column as the file names it, sorted lists first by line.
 * @example describeProblem({ line: 12, column: 'md', message: "'abc' is not a number" }, []) // "line 12, column md: 'abc' is not a number"
 */
export function describeProblem(problem: ImportProblem, columns: readonly { name: string; field: string | null }[]): string {
  const column = problemColumn(problem, columns);
  return formatProblem(column === undefined ? { line: problem.line, message: problem.message } : { ...problem, column });
}

/**
 * Problems by line (stable within a line), the order a person reads the file in.
 * @example sortProblems([{ line: 6, message: 'b' }, { line: 3, message: 'a' }]).map((p) => p.line) // [3, 6]
 */
export function sortProblems(problems: readonly ImportProblem[]): ImportProblem[] {
  return problems
    .map((p, i) => ({ p, i }))
    .sort((a, b) => a.p.line - b.p.line || a.i - b.i)
    .map(({ p }) => p);
}

/** One line of the preview table: a parsed row, or a line left out for its problems. */
export interface PreviewLine {
  line: number;
  row: PreviewRow | null;
  problems: ImportProblem[];
}

/** How many rows of the file the server returns in a preview (server/features/imports/imports.service.ts). */
export const PREVIEW_ROW_LIMIT = 50;

/**
 * The preview rows with the invalid lines among them, in file order. The server returns only valid rows
 * (the first 50); invalid lines are slotted in where they fall, up to the last line the preview reaches.
 * @example previewLines([{ line: 2 }, { line: 4 }], [{ line: 3, message: 'bad' }], [3]).map((l) => l.line) // [2, 3, 4]
 */
export function previewLines(
  rows: readonly PreviewRow[],
  problems: readonly ImportProblem[],
  invalidLines: readonly number[],
): PreviewLine[] {
  const byLine = problemsByLine(problems);
  const lines: PreviewLine[] = rows.map((row) => {
    const line = Number(row.line);
    return { line, row, problems: byLine.get(line) ?? [] };
  });
  const truncated = rows.length >= PREVIEW_ROW_LIMIT;
  const lastShown = lines.length ? Math.max(...lines.map((l) => l.line)) : Infinity;
  const extra = invalidLines
    .filter((line) => !truncated || line < lastShown)
    .slice(0, PREVIEW_ROW_LIMIT)
    .map((line) => ({ line, row: null, problems: byLine.get(line) ?? [] }));
  return [...lines, ...extra].sort((a, b) => a.line - b.line);
}

export interface CommitChoices {
  skipInvalid: boolean;
  onDuplicate: 'update' | 'skip' | null;
}

/**
 * Why the preview cannot be committed yet, or null when it can.
 * @example commitBlocker({ kind: 'wells', problems: [p], counts: { valid: 2 }, duplicateOf: null }, { skipInvalid: true, onDuplicate: null }) // null
 */
export function commitBlocker(
  preview: Pick<ImportPreview, 'kind' | 'problems' | 'counts' | 'duplicateOf'>,
  choices: CommitChoices,
): string | null {
  const problems = preview.problems.length;
  if (preview.kind === 'las' && problems > 0) {
    return 'A LAS file imports whole or not at all: resolve the problems above first (choose the well if it was not matched).';
  }
  if (preview.counts.valid === 0) return 'Nothing to import: no row of this file is valid yet.';
  if (problems > 0 && !choices.skipInvalid) {
    return `${problems} problem${problems === 1 ? '' : 's'} found. Fix the file, or tick “Import valid rows, skip the rest”.`;
  }
  if (preview.duplicateOf && !choices.onDuplicate) {
    return 'This file was imported before: choose whether to update from it again or skip it.';
  }
  return null;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString('en')} ${n === 1 ? one : many}`;

/**
 * One line about what an import wrote, for the history table and the outcome.
 * @example outcomeSummary('wells', { created: 3, updated: 1, skippedLines: [4, 5] }) // '3 wells created, 1 updated · 2 lines skipped'
 */
export function outcomeSummary(kind: ImportKind, outcome: Record<string, unknown> | null | undefined): string {
  if (!outcome || typeof outcome.created !== 'number') return 'no outcome recorded';
  const created = outcome.created;
  const updated = typeof outcome.updated === 'number' ? outcome.updated : 0;
  const wells = typeof outcome.wells === 'number' ? outcome.wells : null;
  const skipped = Array.isArray(outcome.skippedLines) ? outcome.skippedLines.length : 0;
  const main: Record<ImportKind, string> = {
    wells: `${plural(created, 'well')} created, ${updated.toLocaleString('en')} updated`,
    surveys: `${plural(created, 'station')}${wells === null ? '' : ` for ${plural(wells, 'well')}`}`,
    pressures: `${plural(created, 'pressure observation')}`,
    tops: `${plural(created, 'formation top')}`,
    las: `${plural(created, 'log curve')}${
      typeof outcome.wellName === 'string'
        ? ` into ${outcome.wellCreated === true ? 'new well' : 'well'} ${outcome.wellName}${outcome.wellCreated === true ? ' (created from the file)' : ''}`
        : outcome.wellCreated === true
          ? ' into a well created from the file'
          : ''
    }`,
  };
  const replaced =
    typeof outcome.replaced === 'number' && outcome.replaced > 0
      ? ` · ${plural(outcome.replaced, 'row')} of the earlier import replaced`
      : '';
  return `${main[kind]}${replaced}${skipped > 0 ? ` · ${plural(skipped, 'line')} skipped` : ''}`;
}

/**
 * A file size in the units the server's limit is stated in (1 MB = 1024 × 1024 bytes there).
 * @example formatBytes(1536) // '1.5 kB'
 */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

const DELIMITER_NAMES: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', '|': 'vertical bar', ' ': 'space' };

/**
 * A detected delimiter as words (a bare tab or space is invisible).
 * @example delimiterName('\t') // 'tab'
 */
export function delimiterName(delimiter: string): string {
  return DELIMITER_NAMES[delimiter]
    ? `${DELIMITER_NAMES[delimiter]}${delimiter.trim() ? ` ( ${delimiter} )` : ''}`
    : JSON.stringify(delimiter);
}

/** Names the well rows of a preview refer to, for links after the import (first `limit`, unique). */
export function wellNamesOf(kind: ImportKind, rows: readonly PreviewRow[], limit = 12): string[] {
  const key = kind === 'wells' ? 'name' : kind === 'surveys' ? 'well' : 'wellName';
  const names: string[] = [];
  for (const r of rows) {
    const name = r[key];
    if (typeof name === 'string' && !names.includes(name)) names.push(name);
    if (names.length >= limit) break;
  }
  return names;
}
