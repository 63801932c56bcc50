/**
 * Read speed of the two import formats, printed by vitest as ratios against a reference run in the
 * same process: for LAS a naive split-and-Number() reading of the same text (a lower bound: no checks),
 * for CSV the general-purpose d3-dsv parser. Run: npx vitest bench --run shared/formats/formats.bench.ts
 */
import { dsvFormat } from 'd3';
import { bench, describe } from 'vitest';
import { parseCsv } from './csv';
import { parseLas, writeLas } from './las';

const LAS_ROWS = 100_000;
const CSV_ROWS = 200_000;

const depths = Float64Array.from({ length: LAS_ROWS }, (_, i) => Math.round((1000 + i * 0.1524) * 1e4) / 1e4);
const curve = (f: (i: number) => number) => Float64Array.from({ length: LAS_ROWS }, (_, i) => Math.round(f(i) * 100) / 100);
const lasText = writeLas({
  index: { unit: 'm', values: depths },
  curves: [
    { mnemonic: 'DT', unit: 'US/M', values: curve((i) => 330 + 20 * Math.sin(i / 50)) },
    { mnemonic: 'GR', unit: 'GAPI', values: curve((i) => 80 + 30 * Math.cos(i / 70)) },
    { mnemonic: 'RHOB', unit: 'G/CC', values: curve((i) => 2.3 + i * 2e-6) },
    { mnemonic: 'ILD', unit: 'OHMM', values: curve((i) => (i % 997 === 0 ? NaN : 1 + (i % 7) / 3)) },
    { mnemonic: 'NPHI', unit: 'V/V', values: curve((i) => 0.35 - i * 1e-6) },
  ],
});

const csvLines = ['well,md_m,tvd_m,pressure_psi,emw_ppg,source,date,comment,quality'];
for (let i = 0; i < CSV_ROWS; i++) {
  csvLines.push(
    `KESTREL-3,${(1000 + i * 0.1).toFixed(1)},${(999 + i * 0.1).toFixed(2)},${(2000 + i * 0.01).toFixed(2)},8.5,RFT,2024-03-14,normal,good`,
  );
}
const csvText = csvLines.join('\n');

describe(`LAS 2.0, ${LAS_ROWS} data lines`, () => {
  bench('parseLas', () => {
    parseLas(lasText);
  });
  bench('reference: split lines and Number() every token', () => {
    const lines = lasText.split('\n');
    let sum = 0;
    for (let i = lines.findIndex((l) => l.startsWith('~A')) + 1; i < lines.length; i++)
      for (const t of lines[i].trim().split(/\s+/)) sum += Number(t);
    if (sum === 0) throw new Error('nothing read');
  });
});

describe(`CSV, ${CSV_ROWS} rows`, () => {
  bench('parseCsv', () => {
    parseCsv(csvText);
  });
  bench('reference: d3-dsv parseRows', () => {
    dsvFormat(',').parseRows(csvText);
  });
});
