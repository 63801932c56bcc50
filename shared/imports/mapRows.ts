import { parseNumber } from '../formats/csv';
import type { CsvFile } from '../formats/csv';
import type { Problem } from '../formats/problem';
import { convert } from '../units';
import { IMPORT_FIELDS, UNITS_FOR_QUANTITY, type CsvImportKind, type ImportField } from './fields';

export type CellValue = string | number | boolean | null;

/** One CSV record with its fields read, checked, and depths converted to metres. */
export interface MappedRecord {
  line: number;
  values: Record<string, CellValue>;
  /** The unit of the `value` field for pressure rows, as chosen for the column. */
  valueUnit?: string;
}

export interface MappedRows {
  records: MappedRecord[];
  problems: Problem[];
  /**
   * The records that had problems (their lines are the invalid ones), with the fields that did read (the bad ones
   * null), so later checks (coordinates, depths) can report every problem of a row at once instead of one round at a time.
   */
  rejected: MappedRecord[];
  /** Field key → the CSV column it is read from, so later checks can name the column as the file does. */
  columnOfField: Record<string, string>;
}

/** Column → field key (null: ignore the column). */
export type ColumnMapping = Record<string, string | null>;
/** Field key → unit of its column. */
export type FieldUnits = Record<string, string>;

const TRUE_WORDS = new Set(['yes', 'y', 'true', 't', '1', 'offshore', 'marine']);
const FALSE_WORDS = new Set(['no', 'n', 'false', 'f', '0', 'onshore', 'land']);

/** Accepts ISO dates (2019-04-23, 2019/04/23) only: a day-first or month-first date is ambiguous. */
function parseDate(cell: string): string | null {
  const m = /^(\d{4})[-/](\d{1,2})[-/](\d{1,2})$/.exec(cell.trim());
  if (!m) return null;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const date = new Date(Date.UTC(y, mo - 1, d));
  if (date.getUTCFullYear() !== y || date.getUTCMonth() !== mo - 1 || date.getUTCDate() !== d) return null;
  return `${m[1]}-${String(mo).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
}

/** Enumerated text matched loosely ("Formation test" → formation_test, "LOT" → lot). */
function matchEnum(cell: string, values: readonly string[]): string | null {
  const key = cell
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
  const exact = values.find((v) => v.toLowerCase() === key);
  if (exact) return exact;
  const synonyms: Record<string, string> = {
    formation_pressure_test: 'formation_test',
    formation_pressure: 'formation_test',
    rft: 'formation_test',
    mdt: 'formation_test',
    wireline_test: 'formation_test',
    fpt: 'formation_test',
    drill_stem_test: 'dst',
    mud_weight_in_use: 'mud_weight',
    mud: 'mud_weight',
    mw: 'mud_weight',
    leak_off: 'lot',
    leak_off_test: 'lot',
    formation_integrity_test: 'fit',
    integrity_test: 'fit',
    lost_circulation: 'loss',
    losses: 'loss',
    influx: 'kick',
    estimate: 'pp_estimate',
    pore_pressure_estimate: 'pp_estimate',
  };
  const syn = synonyms[key];
  return syn && values.includes(syn) ? syn : null;
}

/** The unit used for a numeric field: the chosen one, else the first offered for its quantity. */
export function unitFor(field: ImportField, units: FieldUnits): string | undefined {
  if (!field.quantity) return undefined;
  return units[field.key] ?? UNITS_FOR_QUANTITY[field.quantity][0];
}

/**
 * Reads every record of a CSV file into the fields of an import kind, by the given column mapping.
 * Every bad cell is reported with its line and column; records with problems are left out.
 * @example mapCsvRows(parseCsv('well,md,inc,azi\nA-1,100,0,0'), 'surveys', { well: 'well', md: 'md', inc: 'inc', azi: 'azi' }, { md: 'm' })
 */
export function mapCsvRows(csv: CsvFile, kind: CsvImportKind, mapping: ColumnMapping, units: FieldUnits): MappedRows {
  const fields = IMPORT_FIELDS[kind];
  const problems: Problem[] = [];
  const columnOf = new Map<string, number>();
  for (const [column, fieldKey] of Object.entries(mapping)) {
    if (!fieldKey) continue;
    const index = csv.header.indexOf(column);
    if (index < 0) {
      problems.push({ line: 1, column, message: `the mapping names a column "${column}" that the file does not have` });
      continue;
    }
    if (!fields.some((f) => f.key === fieldKey)) {
      problems.push({ line: 1, column, message: `"${fieldKey}" is not a field of a ${kind} import` });
      continue;
    }
    if (columnOf.has(fieldKey)) {
      problems.push({ line: 1, column, message: `field "${fieldKey}" is mapped from two columns` });
      continue;
    }
    columnOf.set(fieldKey, index);
  }
  for (const f of fields) {
    if (f.required && !columnOf.has(f.key))
      problems.push({ line: 1, message: `no column is mapped to the required field "${f.label}" (${f.key})` });
    const unit = unitFor(f, units);
    if (f.quantity && unit && !UNITS_FOR_QUANTITY[f.quantity].includes(unit)) {
      const index = columnOf.get(f.key);
      problems.push({
        line: 1,
        column: index === undefined ? f.key : csv.header[index],
        message: `unit "${unit}" is not one of ${UNITS_FOR_QUANTITY[f.quantity].join(', ')}`,
      });
    }
  }
  const columnOfField = Object.fromEntries([...columnOf].map(([key, index]) => [key, csv.header[index]]));
  if (problems.length) return { records: [], problems, rejected: [], columnOfField };

  const records: MappedRecord[] = [];
  const rejected: MappedRecord[] = [];
  const format = { decimalComma: csv.decimalComma };
  for (const row of csv.rows) {
    const values: Record<string, CellValue> = {};
    let ok = true;
    const bad = (f: ImportField, message: string) => {
      problems.push({ line: row.line, column: csv.header[columnOf.get(f.key)!], message });
      values[f.key] = null;
      ok = false;
    };
    for (const f of fields) {
      const index = columnOf.get(f.key);
      const cell = index === undefined ? '' : (row.cells[index] ?? '').trim();
      if (cell === '') {
        if (f.required) bad(f, `${f.label} is required`);
        values[f.key] = null;
        continue;
      }
      if (f.type === 'number') {
        const n = parseNumber(cell, format);
        if (n === null || Number.isNaN(n) || !Number.isFinite(n)) {
          bad(f, `'${cell}' is not a number`);
          continue;
        }
        values[f.key] = f.quantity === 'depth' ? convert(n, unitFor(f, units)!, 'm') : n;
      } else if (f.type === 'date') {
        const d = parseDate(cell);
        if (!d) bad(f, `'${cell}' is not a date (write it as YYYY-MM-DD)`);
        else values[f.key] = d;
      } else if (f.type === 'boolean') {
        const word = cell.toLowerCase();
        if (TRUE_WORDS.has(word)) values[f.key] = true;
        else if (FALSE_WORDS.has(word)) values[f.key] = false;
        else bad(f, `'${cell}' is not yes or no`);
      } else if (f.values) {
        const v = matchEnum(cell, f.values);
        if (!v) bad(f, `'${cell}' is not one of ${f.values.join(', ')}`);
        else values[f.key] = v;
      } else {
        values[f.key] = cell;
      }
    }
    let valueUnit: string | undefined;
    if (ok && kind === 'pressures') {
      // A unit column, when mapped, says the unit row by row (files often mix psi and ppg).
      const perRow = values.valueUnit;
      const offered = UNITS_FOR_QUANTITY.pressureOrDensity;
      if (typeof perRow === 'string') {
        valueUnit = offered.find((u) => u.toLowerCase() === perRow.toLowerCase().replace(/\s+/g, ''));
        if (!valueUnit) {
          problems.push({
            line: row.line,
            column: csv.header[columnOf.get('valueUnit')!],
            message: `unit '${perRow}' is not one of ${offered.join(', ')}`,
          });
          ok = false;
        }
      } else
        valueUnit = unitFor(
          fields.find((f) => f.key === 'value')!,
          units,
        );
    }
    if (ok) records.push(valueUnit ? { line: row.line, values, valueUnit } : { line: row.line, values });
    else rejected.push({ line: row.line, values });
  }
  return { records, problems, rejected, columnOfField };
}
