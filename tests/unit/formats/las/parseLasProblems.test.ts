import { describe, expect, it } from 'vitest';
import { formatProblem } from '@shared/formats/problem';
import { LAS3_MESSAGE, parseLas } from '@shared/formats/las';
import { fixtureText } from '../fixtures';

// What must exist and what is allowed: CWLS, "LAS Version 2.0: A Digital Standard for Logs", 2014 update
// (§5.3 ~V with VERS and WRAP, §5.4 ~W, §5.5 ~C, §5.8 ~A last, one value per curve). Line numbers were
// counted in the fixture files (grep -n).
const las = (name: string) => parseLas(fixtureText('las', name));

const HEADER = [
  '~VERSION INFORMATION',
  'VERS.   2.0 : CWLS LOG ASCII STANDARD - VERSION 2.0',
  'WRAP.   NO  : ONE LINE PER DEPTH STEP',
  '~WELL INFORMATION',
  'STRT.M   100.0 : START DEPTH',
  'STOP.M   101.0 : STOP DEPTH',
  'STEP.M   0.5   : STEP',
  'NULL.    -999.25 : NULL VALUE',
  'COMP. SYNTHETIC SURVEY CO : COMPANY',
  'WELL. KESTREL-3 : WELL',
  'FLD . GREYFEN : FIELD',
  'LOC . BLOCK Q-17 : LOCATION',
  'PROV. NORTHMARCH : PROVINCE',
  'SRVC. SYNTHETIC WIRELINE SERVICES : SERVICE COMPANY',
  'DATE. 2024-03-14 : LOG DATE',
  'UWI . 100000000000W500 : UNIQUE WELL ID',
  '~CURVE INFORMATION',
  'DEPT.M  : DEPTH',
  'GR  .GAPI : GAMMA RAY',
]; // 19 lines; ~A goes on line 20
const withData = (...data: string[]) => [...HEADER, '~A', ...data].join('\n');

describe('parseLas reports problems with their line', () => {
  it('a missing ~A section, at the last line of the file', () => {
    expect(las('missing-a.las').errors).toEqual([{ line: 23, message: 'the ~A section is missing' }]);
  });

  it('a data line with one value too few, and leaves that row out', () => {
    const result = las('wrong-value-count.las');
    expect(result.errors).toEqual([{ line: 57, message: 'expected 6 values, found 5' }]);
    expect(formatProblem(result.errors[0])).toBe('line 57: expected 6 values, found 5');
    expect(result.index.values).toHaveLength(39);
    expect(result.warnings).toEqual([]); // the gap left by the refused row is not a second, STEP problem
  });

  it('text in numeric data, naming the curve, and keeps the row with NaN', () => {
    const result = las('text-in-numbers.las');
    expect(result.errors).toEqual([
      { line: 31, column: 'GR', message: "'8O.5' is not a number" },
      { line: 36, column: 'RHOB', message: "'n/a' is not a number" },
    ]);
    expect(formatProblem(result.errors[0])).toBe("line 31, column GR: '8O.5' is not a number");
    expect(result.index.values).toHaveLength(20);
    expect(result.curves[1].values[6]).toBeNaN();
    expect(result.curves[1].values[5]).toBe(91.83);
  });

  it('LAS 3.0, refused at the VERS line', () => {
    const result = las('las30.las');
    expect(result.errors).toEqual([{ line: 2, message: 'LAS 3.0 is not supported; save as LAS 2.0' }]);
    expect(LAS3_MESSAGE).toBe('LAS 3.0 is not supported; save as LAS 2.0');
    expect(result.version).toBe(3);
  });

  it('a line over 10,000 characters', () => {
    const result = las('huge-line.las');
    expect(result.errors).toEqual([{ line: 29, message: 'line is 12059 characters long; the limit is 10000' }]);
    expect(result.index.values).toHaveLength(9);
    expect(result.warnings).toEqual([]);
  });

  it('a depth that goes back up, at the line where the order breaks', () => {
    const result = las('non-monotonic.las');
    expect(result.errors).toEqual([
      {
        line: 34,
        column: 'DEPT',
        message: 'index 1003.75 is not greater than 1004 on line 33; the index must be strictly increasing',
      },
    ]);
    expect(result.warnings).toEqual([{ line: 35, message: 'STEP is 0.5 but the index steps by 1.25 from line 34 to this line' }]);
  });

  it('a null marker the data uses that is not the declared NULL blocks, at the NULL line, and its samples are gaps', () => {
    const result = las('wrong-null-sentinel.las');
    expect(result.errors).toEqual([
      {
        line: 8,
        column: 'NULL',
        message:
          "the file's NULL is -999.25 but its data uses -9999 for gaps (9 samples of GR, RHOB, first at line 25); correct NULL in ~W",
      },
    ]);
    expect(result.warnings).toEqual([]);
    // 12 samples, 6 of GR and 3 of RHOB are -9999: those count as gaps, not as readings.
    const valid = (m: string) => result.curves.find((c) => c.mnemonic === m)!.values.filter((v) => !Number.isNaN(v)).length;
    expect([valid('GR'), valid('RHOB'), valid('DT')]).toEqual([6, 9, 12]);
  });

  it('a large negative run at the edge of a curve that is no known marker only warns', () => {
    const text = fixtureText('las', 'wrong-null-sentinel.las').replaceAll('-9999 ', '-1234 ');
    const result = parseLas(text);
    expect(result.errors).toEqual([]);
    expect(result.warnings.map((w) => w.message)).toEqual([
      'value -1234 occurs 9 times (GR, RHOB) like a null marker, but NULL is -999.25 (line 8); check NULL in ~W',
    ]);
  });

  it('missing ~V, ~W and ~C', () => {
    const noVersion = parseLas(withData('100 1').split('\n').slice(3).join('\n'));
    expect(noVersion.errors).toEqual([{ line: 1, message: 'the ~V section is missing' }]);

    const noWellNoCurves = parseLas(['~V', 'VERS. 2.0 :', 'WRAP. NO :', '~A', '100 1'].join('\n'));
    expect(noWellNoCurves.errors).toEqual([
      { line: 4, message: 'the ~W section is missing' },
      { line: 4, message: 'the ~C section is missing' },
    ]);
  });

  it('a missing or unknown WRAP and a version that is not 2.0', () => {
    const noWrap = parseLas(withData('100 1', '100.5 2', '101 3').replace('WRAP.   NO  : ONE LINE PER DEPTH STEP\n', ''));
    expect(noWrap.errors).toEqual([{ line: 1, message: 'WRAP is missing from ~V' }]);
    expect(noWrap.index.values).toHaveLength(3); // read as WRAP NO, guessed from the data

    expect(parseLas(withData('100 1').replace('WRAP.   NO ', 'WRAP.   MAYBE')).errors).toEqual([
      { line: 3, message: "WRAP must be YES or NO, found 'MAYBE'" },
    ]);
    expect(parseLas(withData('100 1').replace('VERS.   2.0', 'VERS.   4.0')).errors).toEqual([
      { line: 2, message: "VERS '4.0' is not 2.0" },
    ]);
  });

  it('STRT and STOP that do not match the data', () => {
    const result = parseLas(withData('100 1', '100.5 2').replace('STRT.M   100.0', 'STRT.M   99.5'));
    expect(result.errors).toEqual([]);
    expect(result.warnings).toEqual([
      { line: 5, message: 'STRT is 99.5 but the first index value is 100 (line 21)' },
      { line: 6, message: 'STOP is 101 but the last index value is 100.5 (line 22)' },
    ]);
  });

  it('a repeated depth and a NULL depth', () => {
    const result = parseLas(withData('100 1', '100 2', '-999.25 3', '101 4'));
    expect(result.errors).toEqual([
      { line: 22, column: 'DEPT', message: 'index 100 is not greater than 100 on line 21; the index must be strictly increasing' },
      { line: 23, column: 'DEPT', message: 'the index value is the NULL value -999.25' },
    ]);
  });

  it('one wild depth at the end breaks the order at that line only', () => {
    const result = parseLas(withData('100 1', '100.5 2', '101 3', '101.5 4', '10 5'));
    expect(result.errors).toEqual([
      { line: 25, column: 'DEPT', message: 'index 10 is not greater than 101.5 on line 24; the index must be strictly increasing' },
    ]);
  });

  it('an index that is not a depth', () => {
    const result = parseLas(withData('100 1').replace('DEPT.M  : DEPTH', 'TIME.S  : TIME'));
    expect(result.errors).toEqual([{ line: 18, message: "the index curve TIME has unit 'S'; expected a depth unit M, FT or F" }]);
    expect(result.index.unit).toBeNull();
    expect(result.index.valuesM[0]).toBeNaN();
  });

  it('takes the index unit from STRT when ~C gives none', () => {
    const result = parseLas(withData('100 1', '100.5 2', '101 3').replace('DEPT.M  : DEPTH', 'DEPT.  : DEPTH'));
    expect(result.errors).toEqual([]);
    expect(result.index.unit).toBe('m');
  });

  it('a missing NULL (−999.25 assumed) and missing required ~W items', () => {
    const text = withData('100 -999.25', '100.5 2', '101 3')
      .replace('NULL.    -999.25 : NULL VALUE\n', '')
      .replace('UWI . 100000000000W500 : UNIQUE WELL ID\n', '');
    const result = parseLas(text);
    expect(result.warnings).toEqual([
      { line: 4, message: 'NULL is missing from ~W; -999.25 assumed' },
      { line: 4, message: '~W lacks UWI or API (required by LAS 2.0)' },
    ]);
    expect(result.curves[0].values[0]).toBeNaN();
  });

  it('WRAP YES records with too many values or cut short', () => {
    // ~A on line 21; records start on lines 22, 24, 27 and 29.
    const text = [
      ...HEADER.slice(0, 2),
      'WRAP.   YES : MULTIPLE LINES',
      ...HEADER.slice(3),
      'RHOB.G/CC : DENSITY',
      '~A',
      '100.0',
      '80 2.3',
      '100.5',
      '81',
      '2.31 7',
      '101.0',
      '82 2.32',
      '101.5',
      '83',
    ].join('\n');
    const result = parseLas(text);
    expect(result.errors).toEqual([
      { line: 26, message: 'expected 2 values after the index 100.5 (line 24), found 3' },
      { line: 29, message: 'expected 2 values after the index 101.5, found 1 before the data ends' },
    ]);
    expect(Array.from(result.index.values)).toEqual([100, 101]);
  });

  it('binary bytes instead of text', () => {
    expect(parseLas(new Uint8Array([0x7e, 0x56, 0x00, 0x00, 0x12])).errors).toEqual([{ line: 1, message: 'File looks binary, not text' }]);
  });

  it('stops listing after 200 errors and says how many more there are', () => {
    const bad = Array.from({ length: 300 }, (_, i) => `${100 + i * 0.5}`); // one value per line, two expected
    const result = parseLas(withData(...bad));
    expect(result.errors).toHaveLength(201);
    expect(result.errors[200]).toEqual({ line: 221, message: '100 more problems from this line on are not listed' });
  });
});
