import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCsv, suggestColumnMatches } from '@shared/formats/csv';
import { IMPORT_FIELDS } from '@shared/imports/fields';
import { mapCsvRows } from '@shared/imports/mapRows';
import {
  assignField,
  commitBlocker,
  describeProblem,
  importRequest,
  mappingFromCsv,
  missingRequired,
  outcomeSummary,
  previewLines,
  problemColumn,
  problemsByLine,
  requestUnits,
  sortProblems,
  type ImportChoices,
} from './importModel';

// The mapping model is checked against the readers the server runs on the request (shared/formats/csv and
// shared/imports/mapRows), and the problem texts against the server's replies for tests/fixtures/imports.

const fixture = (name: string) => readFileSync(`tests/fixtures/imports/${name}`, 'utf8');
const columnsOf = (text: string, kind: 'wells' | 'surveys') => {
  const csv = parseCsv(text);
  return suggestColumnMatches(csv.header, IMPORT_FIELDS[kind]).map((m) => ({ name: m.column, field: m.field }));
};

const choices = (patch: Partial<ImportChoices>): ImportChoices => ({
  kind: 'wells',
  mapping: null,
  units: {},
  epsg: 4326,
  wellId: null,
  curveRoles: {},
  ...patch,
});

describe('mapping and units → request', () => {
  it('sends nothing to guess on the first preview, so the server suggests from the headers', () => {
    expect(importRequest(choices({}))).toEqual({ kind: 'wells', epsg: 4326 });
    expect(importRequest(choices({ kind: 'tops' }))).toEqual({ kind: 'tops' });
  });

  it('sends a LAS file the EPSG code of its X/Y only when one was chosen', () => {
    expect(importRequest(choices({ kind: 'las' }))).toEqual({ kind: 'las' });
    expect(importRequest(choices({ kind: 'las', epsg: 32631 }))).toEqual({ kind: 'las', epsg: 32631 });
  });

  it('produces a mapping and units the shared reader accepts, converting feet to metres', () => {
    const text = 'Well,Easting,Northing,WD\nUTM-1,500000,6400000,300\n';
    const csv = parseCsv(text);
    let mapping = mappingFromCsv({ columns: columnsOf(text, 'wells') });
    // "Well" is a name alias; Easting/Northing are x/y aliases; WD is the water depth alias.
    expect(mapping).toEqual({ Well: 'name', Easting: 'x', Northing: 'y', WD: 'waterDepth' });
    mapping = assignField(mapping, 'WD', 'waterDepth');
    const request = importRequest(choices({ mapping, units: { waterDepth: 'ft', tdMd: 'm' }, epsg: 32713 }));
    expect(request).toEqual({ kind: 'wells', mapping, units: { waterDepth: 'ft' }, epsg: 32713 });

    const read = mapCsvRows(csv, 'wells', request.mapping!, request.units!);
    expect(read.problems).toEqual([]);
    // 300 ft × 0.3048 m/ft (exact since 1959) = 91.44 m.
    expect(read.records[0].values.waterDepth).toBeCloseTo(91.44, 9);
  });

  it('moves a field to the column it is chosen for, so no field is read from two columns', () => {
    const mapping = assignField({ depth: 'md', 'md (ft)': null, note: null }, 'md (ft)', 'md');
    expect(mapping).toEqual({ depth: null, 'md (ft)': 'md', note: null });
    const csv = parseCsv('well,depth,md (ft),inc,azi\nA,1,2,0,0\n');
    const read = mapCsvRows(csv, 'surveys', { well: 'well', ...mapping, inc: 'inc', azi: 'azi' }, { md: 'ft' });
    expect(read.problems).toEqual([]);
    expect(read.records[0].values.md).toBeCloseTo(2 * 0.3048, 12);
  });

  it('names the required fields still unmapped, as the server would refuse them', () => {
    const mapping = mappingFromCsv({ columns: columnsOf(fixture('wells-missing-columns.csv'), 'wells') });
    expect(missingRequired('wells', mapping).map((f) => f.key)).toEqual(['x', 'y']);
    const server = mapCsvRows(parseCsv(fixture('wells-missing-columns.csv')), 'wells', mapping, {});
    expect(server.problems.map((p) => p.message)).toEqual([
      'no column is mapped to the required field "Longitude or easting" (x)',
      'no column is mapped to the required field "Latitude or northing" (y)',
    ]);
  });

  it('sends a unit only for mapped fields that have a quantity, defaulting to the first unit offered', () => {
    expect(requestUnits('pressures', { P: 'value', D: 'md', K: 'kind' }, {})).toEqual({ value: 'psi', md: 'm' });
  });

  it('sends LAS curve roles as the mapping and the chosen well', () => {
    expect(importRequest(choices({ kind: 'las', curveRoles: { GR: 'other' }, wellId: 'w1' }))).toEqual({
      kind: 'las',
      mapping: { GR: 'other' },
      wellId: 'w1',
    });
  });
});

// The server's answer for wells-bad.csv (tests/api/imports.test.ts): cell problems carry the header,
// planning problems the field key.
const badProblems = [
  { line: 3, column: 'Longitude', message: "'abc' is not a number" },
  { line: 6, column: 'Latitude', message: 'Latitude or northing is required' },
  { line: 4, column: 'x', message: 'latitude -132.4 is outside −90..90' },
  { line: 5, column: 'name', message: 'duplicate well "BAD-1" (first at line 2)' },
];

describe('problems by line', () => {
  const columns = columnsOf(fixture('wells-bad.csv'), 'wells');

  it('names every problem by its line and the column as the file spells it', () => {
    expect(sortProblems(badProblems).map((p) => describeProblem(p, columns))).toEqual([
      "line 3, column Longitude: 'abc' is not a number",
      'line 4, column Longitude: latitude -132.4 is outside −90..90',
      'line 5, column Well Name: duplicate well "BAD-1" (first at line 2)',
      'line 6, column Latitude: Latitude or northing is required',
    ]);
    // The example sentence from the format's own documentation (shared/formats/problem.ts).
    expect(describeProblem({ line: 12, column: 'md', message: "'abc' is not a number" }, [])).toBe(
      "line 12, column md: 'abc' is not a number",
    );
    expect(problemColumn({ line: 1, message: 'no column' }, columns)).toBeUndefined();
  });

  it('groups problems by line', () => {
    const byLine = problemsByLine([...badProblems, { line: 3, column: 'Latitude', message: 'second' }]);
    expect(byLine.get(3)?.map((p) => p.column)).toEqual(['Longitude', 'Latitude']);
    expect(byLine.has(2)).toBe(false);
  });

  it('slots the invalid lines between the valid rows in file order', () => {
    const lines = previewLines([{ line: 2, name: 'BAD-1' }], badProblems, [3, 4, 5, 6]);
    expect(lines.map((l) => [l.line, l.row === null, l.problems.length])).toEqual([
      [2, false, 0],
      [3, true, 1],
      [4, true, 1],
      [5, true, 1],
      [6, true, 1],
    ]);
  });

  it('shows only the invalid lines the 50 previewed rows reach when the preview is cut off', () => {
    const rows = Array.from({ length: 50 }, (_, i) => ({ line: i + 2 }));
    const lines = previewLines(rows, [], [30, 200]);
    expect(lines.filter((l) => l.row === null).map((l) => l.line)).toEqual([30]);
  });
});

describe('commitBlocker', () => {
  const preview = { kind: 'wells' as const, problems: badProblems, counts: { records: 5, invalid: 4, valid: 1 }, duplicateOf: null };

  it('asks for the skip choice while problems exist, and allows the commit with it', () => {
    expect(commitBlocker(preview, { skipInvalid: false, onDuplicate: null })).toMatch(/4 problems found/);
    expect(commitBlocker(preview, { skipInvalid: true, onDuplicate: null })).toBeNull();
  });

  it('refuses when nothing is valid, a LAS file has problems, or a re-import has no decision', () => {
    expect(commitBlocker({ ...preview, counts: { records: 5, invalid: 5, valid: 0 } }, { skipInvalid: true, onDuplicate: null })).toMatch(
      /Nothing to import/,
    );
    expect(commitBlocker({ ...preview, kind: 'las' }, { skipInvalid: true, onDuplicate: null })).toMatch(/whole or not at all/);
    const again = { ...preview, problems: [], duplicateOf: { uploadId: 'u', fileName: 'a.csv', createdAt: '2025-01-01T00:00:00Z' } };
    expect(commitBlocker(again, { skipInvalid: false, onDuplicate: null })).toMatch(/imported before/);
    expect(commitBlocker(again, { skipInvalid: false, onDuplicate: 'skip' })).toBeNull();
  });
});

describe('outcomeSummary', () => {
  it('says what each kind wrote, and how many lines were skipped', () => {
    // Outcome shapes as server/features/imports/importWriter.ts returns them.
    expect(outcomeSummary('wells', { created: 1, updated: 0, skippedLines: [3, 4, 5, 6] })).toBe(
      '1 well created, 0 updated · 4 lines skipped',
    );
    expect(outcomeSummary('surveys', { created: 6, wells: 1, skippedLines: [] })).toBe('6 stations for 1 well');
    expect(outcomeSummary('las', { created: 4, skippedLines: [] })).toBe('4 log curves');
    expect(outcomeSummary('pressures', {})).toBe('no outcome recorded');
  });

  it('says when a LAS import created its well and when an update replaced earlier rows', () => {
    expect(outcomeSummary('las', { created: 4, wellCreated: true, replaced: 0, skippedLines: [] })).toBe(
      '4 log curves into a well created from the file',
    );
    expect(outcomeSummary('pressures', { created: 4, replaced: 4, skippedLines: [] })).toBe(
      '4 pressure observations · 4 rows of the earlier import replaced',
    );
  });

  it('names the well a LAS import wrote to, as the server records it', () => {
    expect(outcomeSummary('las', { created: 3, wellCreated: false, wellName: 'KESTREL-3', skippedLines: [] })).toBe(
      '3 log curves into well KESTREL-3',
    );
    expect(outcomeSummary('las', { created: 4, wellCreated: true, wellName: 'OSPREY-9', skippedLines: [] })).toBe(
      '4 log curves into new well OSPREY-9 (created from the file)',
    );
  });
});
