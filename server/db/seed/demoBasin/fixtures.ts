import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { writeLas } from '../../../../shared/formats/las';
import { convert } from '../../../../shared/units';
import { toLocalM } from './frame';
import { DEFAULT_DEMO_SEED } from './generate';
import { BASIN_NAME, demoUwi } from './names';
import type { PathDesign } from './path';
import { buildWell, type DemoWell, type WellSpec } from './well';

/**
 * Example import files for the Import page and the import tests: a handful of extra invented wells of
 * the same basin (never the seeded ones, so importing them creates new wells), their pressures in
 * oilfield units (ft, psi), the survey of the deviated one, and one LAS 2.0 file.
 */
export const FIXTURE_FILES = ['demo-wells.csv', 'demo-pressures.csv', 'demo-survey.csv', 'demo-well.las'] as const;

const VERTICAL: PathDesign = {
  profile: 'vertical',
  kickOffMdM: 0,
  buildDegPer30m: 0,
  holdIncDeg: 0,
  aziDeg: 0,
  tangentM: 0,
  dropDegPer30m: 0,
  finalIncDeg: 0,
};

/** The extra wells, placed in the basin away from the seeded fields. */
const SITES: {
  name: string;
  lon: number;
  lat: number;
  operatorIndex: number;
  spudDate: string;
  design: PathDesign;
  tdBelowTopM: number;
}[] = [
  { name: 'Skelby-1', lon: -101.085, lat: -32.66, operatorIndex: 1, spudDate: '2023-03-14', design: VERTICAL, tdBelowTopM: 900 },
  {
    name: 'Skelby-2',
    lon: -101.07,
    lat: -32.668,
    operatorIndex: 1,
    spudDate: '2023-09-02',
    design: {
      profile: 'build-and-hold',
      kickOffMdM: 700,
      buildDegPer30m: 2.5,
      holdIncDeg: 35,
      aziDeg: 62.5,
      tangentM: 0,
      dropDegPer30m: 0,
      finalIncDeg: 0,
    },
    tdBelowTopM: 700,
  },
  { name: 'Wenlow-1', lon: -100.66, lat: -32.482, operatorIndex: 2, spudDate: '2024-01-20', design: VERTICAL, tdBelowTopM: 1000 },
  { name: 'AVX-91', lon: -101.36, lat: -32.285, operatorIndex: 4, spudDate: '2024-06-05', design: VERTICAL, tdBelowTopM: 600 },
];

/**
 * The fixture wells, built by the same physics as the seeded ones.
 * @example
 * fixtureWells().map((w) => w.name); // ['Skelby-1', 'Skelby-2', 'Wenlow-1', 'AVX-91']
 */
export function fixtureWells(seed = DEFAULT_DEMO_SEED): DemoWell[] {
  return SITES.map((s, k) => {
    const { xM, yM } = toLocalM(s.lon, s.lat);
    const spec: WellSpec = {
      index: 1000 + k,
      name: s.name,
      uwi: demoUwi(s.operatorIndex, 9001 + k),
      operatorIndex: s.operatorIndex,
      xM,
      yM,
      airGapM: 25,
      spudDate: s.spudDate,
      status: 'drilled',
      design: s.design,
      tdBelowTopM: s.tdBelowTopM,
    };
    return buildWell(spec, seed);
  });
}

/** One RFC 4180 field: quoted when it holds a comma, a quote or a line break. */
function csvField(v: string | number | null): string {
  const s = v === null ? '' : String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** RFC 4180: CRLF line ends, a header line, no comment lines. */
function csv(header: string[], rows: (string | number | null)[][]): string {
  return [header, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

const r1 = (v: number) => Math.round(v * 10) / 10;
const r2 = (v: number) => Math.round(v * 100) / 100;
const ft = (m: number) => r1(convert(m, 'm', 'ft'));

function wellsCsv(wells: DemoWell[]): string {
  return csv(
    [
      'name',
      'uwi',
      'operator',
      'longitude',
      'latitude',
      'epsg',
      'datum kind',
      'RT elevation (m)',
      'water depth (m)',
      'air gap (m)',
      'spud date',
      'TD MD (m)',
      'TD TVD (m)',
      'status',
      'offshore',
      'note',
    ],
    wells.map((w) => [
      w.name,
      w.uwi,
      w.operator,
      w.lon,
      w.lat,
      4326,
      w.datumKind,
      w.datumElevationM,
      w.waterDepthM,
      w.airGapM,
      w.spudDate,
      w.tdMdM,
      r1(w.tdTvdM),
      w.status,
      'yes',
      w.note,
    ]),
  );
}

/** Every test, shoe test, kick and loss; every third mud report, to keep the file small. */
function pressuresCsv(wells: DemoWell[]): string {
  const rows: (string | number | null)[][] = [];
  for (const w of wells) {
    let mud = 0;
    for (const p of w.pressures) {
      if (p.kind === 'mud_weight' && mud++ % 3 !== 0) continue;
      // A deviated well's rows leave TVD empty: the importer takes it from the survey.
      const tvd = p.tvdFromSurvey ? null : ft(p.tvdM);
      rows.push([w.name, p.kind, ft(p.mdM), tvd, r1(convert(p.pressurePa, 'Pa', 'psi')), p.quality, p.fluid, p.observedOn, p.source]);
    }
  }
  return csv(['well', 'kind', 'MD (ft)', 'TVD (ft)', 'pressure (psi)', 'quality', 'fluid', 'date', 'source'], rows);
}

function surveyCsv(wells: DemoWell[]): string {
  const rows = wells.flatMap((w) => (w.survey ?? []).map((s) => [w.name, r1(s.mdM), r2(s.incDeg), r2(s.aziDeg)]));
  return csv(['well', 'MD (m)', 'inc (deg)', 'azi (deg)'], rows);
}

/** LAS 2.0 of one vertical well, its own samples over 600 m either side of its top of overpressure. */
function wellLas(w: DemoWell): string {
  const md = w.logs[0].mdM;
  const top = w.truth.column.topTvdM;
  const keep: number[] = [];
  for (let i = 0; i < md.length; i++) if (Math.abs(md[i] - top) <= 600) keep.push(i);
  const pick = (a: Float64Array) => keep.map((i) => a[i]);
  const unit = w.logs[0].indexUnit;
  // Feet loggers write feet: the index back on its 0.5 ft grid (rounded, as the MDs were stored to 0.1 mm).
  const index = unit === 'ft' ? pick(md).map((m) => Math.round(convert(m, 'm', 'ft') * 2) / 2) : pick(md);
  const las = writeLas({
    well: {
      COMP: w.operator,
      WELL: w.name,
      FLD: BASIN_NAME,
      LOC: `${Math.abs(w.lat).toFixed(6)} S ${Math.abs(w.lon).toFixed(6)} W`,
      CTRY: 'none (synthetic, open ocean)',
      SRVC: 'synthetic demo generator',
      DATE: w.spudDate,
      UWI: w.uwi,
    },
    index: { mnemonic: 'DEPT', unit, description: 'Measured depth from the rotary table', values: index },
    curves: w.logs.map((c) => ({ mnemonic: c.mnemonic, unit: c.unit, description: c.description, values: pick(c.values) })),
    parameters: [
      { mnemonic: 'EREF', unit: 'M', value: String(w.datumElevationM), description: 'Rotary table above sea level' },
      { mnemonic: 'WDEP', unit: 'M', value: String(w.waterDepthM), description: 'Water depth' },
    ],
    other: 'Synthetic demo data of an invented well in an invented basin, generated from pressure physics. Not a real well.',
  });
  // LAS 2.0 allows comment lines in the header; writeLas keeps ~O free text, so the marker goes in here.
  return las.replace('~OTHER INFORMATION\r\n', '~OTHER INFORMATION\r\n# synthetic demo data\r\n') + '\r\n';
}

/**
 * The four fixture files as text, keyed by file name (pure; `writeDemoFixtures` puts them on disk).
 * @example
 * Object.keys(demoFixtureFiles()); // ['demo-wells.csv', 'demo-pressures.csv', 'demo-survey.csv', 'demo-well.las']
 */
export function demoFixtureFiles(seed = DEFAULT_DEMO_SEED): Record<(typeof FIXTURE_FILES)[number], string> {
  const wells = fixtureWells(seed);
  const lasWell = wells.find((w) => w.name === 'Wenlow-1')!;
  return {
    'demo-wells.csv': wellsCsv(wells),
    'demo-pressures.csv': pressuresCsv(wells),
    'demo-survey.csv': surveyCsv(wells),
    'demo-well.las': wellLas(lasWell),
  };
}

/**
 * Writes the fixture files into `dir` (default tests/fixtures/demo of the working directory).
 * @example
 * writeDemoFixtures(); // → tests/fixtures/demo/demo-wells.csv, …
 */
export function writeDemoFixtures(dir = join(process.cwd(), 'tests', 'fixtures', 'demo'), seed = DEFAULT_DEMO_SEED): string[] {
  mkdirSync(dir, { recursive: true });
  return Object.entries(demoFixtureFiles(seed)).map(([name, text]) => {
    const path = join(dir, name);
    writeFileSync(path, text);
    return path;
  });
}
