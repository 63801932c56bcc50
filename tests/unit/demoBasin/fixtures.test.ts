import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCsv, suggestColumnMatches } from '@shared/formats/csv';
import { parseLas } from '@shared/formats/las';
import { IMPORT_FIELDS, type CsvImportKind } from '@shared/imports/fields';
import { mapCsvRows } from '@shared/imports/mapRows';
import { demoFixtureFiles, FIXTURE_FILES } from '../../../server/db/seed/demoBasin/fixtures';
import { demoWellSpecs } from '../../../server/db/seed/demoBasin/layout';

const DIR = join(process.cwd(), 'tests', 'fixtures', 'demo');
const files = demoFixtureFiles();
const read = (name: string) => readFileSync(join(DIR, name), 'utf8');

/** The importer's own path: parse, map by the suggested header matches with their units, read every row. */
function importRows(name: string, kind: CsvImportKind) {
  const csv = parseCsv(read(name));
  expect(csv.problems).toEqual([]);
  const matches = suggestColumnMatches(csv.header, IMPORT_FIELDS[kind]);
  const mapping = Object.fromEntries(matches.map((m) => [m.column, m.field]));
  const units = Object.fromEntries(matches.filter((m) => m.field && m.unit).map((m) => [m.field!, m.unit!]));
  for (const f of IMPORT_FIELDS[kind].filter((x) => x.required)) expect(Object.values(mapping)).toContain(f.key);
  return mapCsvRows(csv, kind, mapping, units);
}

describe('demo import fixtures', () => {
  it('are committed exactly as the generator writes them (rerun server/bin/writeDemoFixtures.ts after a change)', () => {
    for (const name of FIXTURE_FILES) expect(read(name), name).toBe(files[name]);
  });

  it('are plain RFC 4180 CSV: CRLF line ends, no comment lines', () => {
    for (const name of FIXTURE_FILES.filter((n) => n.endsWith('.csv'))) {
      const text = read(name);
      expect(text.endsWith('\r\n')).toBe(true);
      expect(text.replace(/\r\n/g, '').includes('\n')).toBe(false);
      expect(text.split('\r\n').some((l) => l.startsWith('#'))).toBe(false);
    }
  });

  it('name wells that the seed does not create, so importing them adds new wells', () => {
    const seeded = new Set(demoWellSpecs(2026).map((s) => s.name));
    const { records, problems } = importRows('demo-wells.csv', 'wells');
    expect(problems).toEqual([]);
    expect(records.length).toBeGreaterThanOrEqual(3);
    for (const r of records) expect(seeded.has(r.values.name as string)).toBe(false);
    expect(records.every((r) => r.values.offshore === true)).toBe(true);
  });

  it('give pressures in feet and psi that read without a problem and stay within 0.5–3.0 sg EMW', () => {
    const { records, problems } = importRows('demo-pressures.csv', 'pressures');
    expect(problems).toEqual([]);
    expect(records[0].valueUnit).toBe('psi');
    const kinds = new Set(records.map((r) => r.values.kind));
    for (const k of ['formation_test', 'mud_weight', 'lot']) expect(kinds.has(k)).toBe(true);
    for (const r of records) {
      const md = r.values.md as number; // metres, converted from ft by the importer
      const tvd = (r.values.tvd as number | null) ?? md;
      // psi → Pa by 6894.757 Pa/psi; EMW = p/(g·TVD) (docs/sources.md [units], [emw]).
      const emwSg = ((r.values.value as number) * 6894.757293168361) / (9.80665 * tvd) / 1000;
      expect(emwSg).toBeGreaterThan(0.5);
      expect(emwSg).toBeLessThan(3.0);
    }
    // The deviated well leaves TVD to the survey.
    expect(records.some((r) => r.values.tvd === null)).toBe(true);
  });

  it('give a survey that reads without a problem, stations every 30 m or less', () => {
    const { records, problems } = importRows('demo-survey.csv', 'surveys');
    expect(problems).toEqual([]);
    expect(records.length).toBeGreaterThan(50);
    for (let i = 1; i < records.length; i++) {
      expect((records[i].values.md as number) - (records[i - 1].values.md as number)).toBeLessThanOrEqual(30 + 1e-9);
    }
  });

  it('give one LAS 2.0 file that parses cleanly and says it is synthetic', () => {
    const text = read('demo-well.las');
    const las = parseLas(text);
    expect(las.errors).toEqual([]);
    expect(las.version).toBe(2);
    expect(las.curves.map((c) => c.mnemonic)).toEqual(['DT', 'RDEP', 'RHOB', 'GR']);
    expect(text).toContain('\r\n# synthetic demo data\r\n');
    const wells = parseCsv(read('demo-wells.csv'));
    const nameColumn = wells.header.indexOf('name');
    const wellLine = las.well.items.find((i) => i.mnemonic === 'WELL')!;
    expect(wells.rows.map((r) => r.cells[nameColumn])).toContain(wellLine.value);
  });
});
