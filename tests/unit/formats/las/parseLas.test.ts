import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { METRES_PER_FOOT, parseLas, suggestCurveRole } from '@shared/formats/las';
import { fixtureBytes, fixtureText } from '../fixtures';

// Structure follows CWLS, "LAS Version 2.0: A Digital Standard for Logs" (2014/2017 updates);
// the fixtures in tests/fixtures/las were written to it by hand (invented wells and companies).
const arr = (a: Float64Array) => Array.from(a);

describe('parseLas on well-formed files', () => {
  it('reads a minimal WRAP NO file in metres', () => {
    const las = parseLas(fixtureText('las', 'minimal-wrap-no-m.las'));
    expect(las.errors).toEqual([]);
    expect(las.warnings).toEqual([]);
    expect(las.notes).toEqual([]);
    expect(las.version).toBe(2);
    expect(las.wrap).toBe('NO');
    expect(las.well).toMatchObject({
      STRT: 1500,
      STOP: 1502,
      STEP: 0.5,
      NULL: -999.25,
      COMP: 'SYNTHETIC SURVEY CO',
      WELL: 'KESTREL-3',
      FLD: 'GREYFEN',
      LOC: 'BLOCK Q-17',
      PROV: 'NORTHMARCH',
      SRVC: 'SYNTHETIC WIRELINE SERVICES',
      DATE: '2024-03-14',
      UWI: '100000000000W500',
      API: '',
    });
    expect(las.well.items.map((i) => i.mnemonic)).toEqual([
      'STRT',
      'STOP',
      'STEP',
      'NULL',
      'COMP',
      'WELL',
      'FLD',
      'LOC',
      'PROV',
      'SRVC',
      'DATE',
      'UWI',
    ]);
    expect(las.well.items[0]).toEqual({ mnemonic: 'STRT', unit: 'M', value: '1500.0000', description: 'START DEPTH', line: 7 });

    expect(las.index).toMatchObject({ mnemonic: 'DEPT', unit: 'm', rawUnit: 'M', description: '1 DEPTH' });
    expect(arr(las.index.values)).toEqual([1500, 1500.5, 1501, 1501.5, 1502]);
    expect(arr(las.index.valuesM)).toEqual([1500, 1500.5, 1501, 1501.5, 1502]);

    expect(las.curves.map((c) => [c.mnemonic, c.unit, c.apiCode])).toEqual([
      ['DT', 'US/M', ''],
      ['GR', 'GAPI', '45 310 01 00'],
      ['RHOB', 'G/CC', '45 350 02 00'],
      ['ILD', 'OHMM', '07 120 46 00'],
    ]);
    // The NULL value −999.25 on line 29 becomes NaN (§5.4).
    expect(arr(las.curves[1].values)).toEqual([78.2, 81.6, NaN, 88.9, 92.3]);
    expect(arr(las.curves[2].values)).toEqual([2.412, 2.405, 2.398, 2.391, 2.384]);
    expect(las.curves.map((c) => suggestCurveRole(c.mnemonic, c.unit))).toEqual(['sonic', 'gamma', 'density', 'resistivity']);
  });

  it('reads feet with a negative STEP and returns ascending depths, every curve reordered', () => {
    const las = parseLas(fixtureText('las', 'feet-negative-step.las'));
    expect(las.errors).toEqual([]);
    expect(las.warnings).toEqual([]);
    expect(las.well).toMatchObject({
      STRT: 5010,
      STOP: 5000,
      STEP: -2.5,
      CNTY: 'ASHDOWN',
      STAT: 'WESTREACH',
      CTRY: 'ERIDANIA',
      API: '00-000-00000',
    });
    expect(las.index).toMatchObject({ unit: 'ft', rawUnit: 'F' });
    expect(arr(las.index.values)).toEqual([5000, 5002.5, 5005, 5007.5, 5010]);
    // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement, 1959): 5000 ft = 1524 m.
    expect(las.index.valuesM[0]).toBeCloseTo(1524, 10);
    expect(las.index.valuesM[4]).toBeCloseTo(5010 * 0.3048, 10);
    expect(METRES_PER_FOOT).toBe(0.3048);
    // Row order in the file is 5010 … 5000; the pairs (depth, DT, GR) must stay together.
    expect(arr(las.curves[0].values)).toEqual([99.8, 100.4, 101.0, 101.9, 102.5]);
    expect(arr(las.curves[1].values)).toEqual([90.2, 91.7, NaN, 94.0, 95.1]);
    expect(las.notes).toEqual([
      { line: 7, message: 'the index decreases down the file (STEP -2.5); all curves were reordered to ascending DEPT' },
    ]);
  });

  it('reads WRAP YES: the index alone on its line, the other ten values over two lines', () => {
    const las = parseLas(fixtureText('las', 'wrap-yes.las'));
    expect(las.errors).toEqual([]);
    expect(las.warnings).toEqual([]);
    expect(las.wrap).toBe('YES');
    expect(las.curves).toHaveLength(10);
    expect(arr(las.index.values)).toEqual([909.5, 909.75, 910]);
    expect(arr(las.curves[0].values)).toEqual([NaN, NaN, NaN]); // DT is NULL throughout
    expect(arr(las.curves[1].values)).toEqual([2692.8137, 2712.646, 2692.7075]); // RHOB
    expect(arr(las.curves[9].values)).toEqual([201.9287, 203.1093, 204.7177]); // CALI, last value of each record
    expect(las.curves[0]).toMatchObject({ mnemonic: 'DT', unit: 'US/M', apiCode: '60 520 32 00', description: '2  SONIC TRANSIT TIME' });
    expect(las.well.items.find((i) => i.mnemonic === 'STRT')).toMatchObject({ value: '910.000', description: '' });
    expect(las.notes.map((n) => n.line)).toEqual([9]);
  });

  it('reads ~P and ~O, skips comment lines and renames repeated mnemonics GR:1, GR:2', () => {
    const las = parseLas(fixtureText('las', 'params-other-comments.las'));
    expect(las.errors).toEqual([]);
    expect(las.warnings).toEqual([{ line: 23, message: 'curve mnemonic GR appears 2 times (lines 23, 24); renamed GR:1, GR:2' }]);
    expect(las.curves.map((c) => c.mnemonic)).toEqual(['GR:1', 'GR:2', 'DTCO']);
    expect(arr(las.curves[1].values)).toEqual([71.5, 72.8, 74.4]);
    expect(las.well.DATE).toBe('2024-03-14 10:42:00');
    expect(las.well.items.find((i) => i.mnemonic === 'LIC')).toMatchObject({ value: '12345', line: 19 });
    expect(las.parameters.map((p) => [p.mnemonic, p.unit, p.value, p.description, p.line])).toEqual([
      ['MUD', '', 'GEL CHEM', 'Mud type', 28],
      ['BHT', 'DEGC', '114.0000', 'Bottom Hole Temperature', 29],
      ['BS', 'MM', '222.0000', 'Bit Size', 30],
      ['DFD', 'K/M3', '1200.0000', 'Mud Weight', 31],
      ['EKB', 'M', '566.9700', 'Elevation Kelly Bushing', 32],
      ['EGL', 'M', '563.6799', 'Elevation Ground Level', 33],
      ['TDL', '', '', 'Loggers depth not recorded', 34],
    ]);
    expect(las.other).toBe('Values are synthetic and follow a smooth compaction trend.\nSecond remark line: with a colon.');
  });

  it('reads LAS 1.2 best-effort with a warning, taking ~W texts from after the colon', () => {
    const las = parseLas(fixtureText('las', 'las12.las'));
    expect(las.errors).toEqual([]);
    expect(las.warnings).toEqual([{ line: 2, message: 'LAS 1.2 file: read as LAS 2.0, best effort' }]);
    expect(las.version).toBe(1.2);
    expect(las.well).toMatchObject({
      COMP: 'SYNTHETIC SURVEY CO',
      WELL: 'KESTREL-2',
      DATE: '25-DEC-88',
      UWI: '100000000002W500',
      NULL: -999.25,
    });
    expect(arr(las.index.values)).toEqual([1669.75, 1669.875, 1670]);
  });

  it('decodes uploaded bytes, Latin-1 included', () => {
    const text = fixtureText('las', 'minimal-wrap-no-m.las').replace('KESTREL-3  ', 'KESTREL-3 S\u00fcd');
    const bytes = new Uint8Array([...text].map((ch) => ch.charCodeAt(0))); // every character < 0x100: Latin-1 bytes
    expect(parseLas(bytes).well.WELL).toBe('KESTREL-3 Süd');
    expect(parseLas(fixtureBytes('las', 'minimal-wrap-no-m.las')).curves).toHaveLength(4);
  });
});

describe('parseLas number reading', () => {
  it('reads every decimal exactly as Number() does (the ECMAScript reference conversion)', () => {
    const decimal = fc
      .tuple(fc.boolean(), fc.stringMatching(/^\d{1,18}$/), fc.stringMatching(/^\d{0,25}$/))
      .map(([neg, whole, frac]) => `${neg ? '-' : ''}${whole}${frac ? `.${frac}` : ''}`);
    fc.assert(
      fc.property(fc.array(decimal, { minLength: 1, maxLength: 20 }), (tokens) => {
        const header = ['~V', 'VERS. 2.0 :', 'WRAP. NO :', '~W', 'NULL. -999.25 :', '~C', 'DEPT.M :', 'X. :', '~A'];
        const lines = tokens.map((t, i) => `${i + 1}  ${t}`);
        const las = parseLas([...header, ...lines].join('\n'));
        const expected = tokens.map((t) => (Number(t) === -999.25 ? NaN : Number(t)));
        expect(Array.from(las.curves[0].values)).toEqual(expected);
      }),
      { numRuns: 300 },
    );
  });
});
