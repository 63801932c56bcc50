import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type LasFile, formatLasNumber, parseLas, writeLas } from '@shared/formats/las';
import { fixtureText } from '../fixtures';

/** What a round trip must keep; line numbers change, so they are left out. */
function content(las: LasFile) {
  const noLine = ({ line: _line, ...rest }: { line: number }) => rest;
  return {
    well: { ...las.well, items: undefined, STRT: undefined, STOP: undefined, STEP: undefined },
    // rawUnit is left out: the writer spells feet FT whatever the file said (F, FT).
    index: { ...las.index, rawUnit: undefined, values: Array.from(las.index.values), valuesM: Array.from(las.index.valuesM) },
    curves: las.curves.map((c) => ({ ...c, values: Array.from(c.values) })),
    parameters: las.parameters.map(noLine),
    other: las.other,
  };
}

describe('writeLas', () => {
  it.each(['minimal-wrap-no-m.las', 'feet-negative-step.las', 'wrap-yes.las', 'params-other-comments.las'])(
    'round-trips %s: parse(write(parse(file))) equals parse(file)',
    (name) => {
      const first = parseLas(fixtureText('las', name));
      const again = parseLas(writeLas(first));
      expect(again.errors).toEqual([]);
      expect(again.warnings).toEqual([]);
      expect(again.wrap).toBe('NO');
      expect(content(again)).toEqual(content(first));
      expect(again.index.unit).toBe(first.index.unit);
    },
  );

  it('writes STRT, STOP and a STEP that the reader accepts, CR LF line ends and NULL for NaN', () => {
    const text = writeLas({
      well: { WELL: 'KESTREL-3', COMP: 'SYNTHETIC SURVEY CO' },
      index: { unit: 'ft', values: [5000, 5000.5, 5001] },
      curves: [{ mnemonic: 'DT', unit: 'US/F', description: 'SONIC', values: [100, NaN, 98.5] }],
    });
    expect(text.split('\r\n')).toContain('~A  DEPT DT');
    expect(text.split('\r\n').slice(-3)).toEqual(['  5000     100', '5000.5 -999.25', '  5001    98.5']);
    const back = parseLas(text);
    expect(back.well).toMatchObject({ STRT: 5000, STOP: 5001, STEP: 0.5, NULL: -999.25, WELL: 'KESTREL-3' });
    expect(back.index.unit).toBe('ft');
    // Every non-comment line of ~V/~W/~C holds the three delimiters (CWLS LAS 2.0, §5.2).
    const header = text.split('\r\n').filter((l) => !l.startsWith('~') && !/^\s*[\d-]/.test(l));
    for (const line of header) expect(line).toMatch(/^[^.]+\.\S*\s.*:/);
  });

  it('writes STEP 0 when the spacing varies, as the standard asks (§5.4)', () => {
    const back = parseLas(writeLas({ index: { unit: 'm', values: [10, 11, 13] }, curves: [] }));
    expect(back.well.STEP).toBe(0);
    expect(back.warnings).toEqual([]);
  });

  it('round-trips any finite values exactly (property test)', () => {
    const value = fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.constant(NaN));
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 30 }),
        fc.integer({ min: 0, max: 3 }),
        fc.array(value, { minLength: 120, maxLength: 120 }),
        (depths, curveCount, pool) => {
          const index = [...depths].sort((a, b) => a - b).map((d) => (Object.is(d, -0) ? 0 : d));
          if (new Set(index).size !== index.length) return;
          const curves = Array.from({ length: curveCount }, (_, k) => ({
            mnemonic: `C${k}`,
            values: index.map((_, i) => {
              const v = pool[(k * 31 + i) % pool.length];
              return v === -999.25 ? NaN : v === 0 ? 0 : v; // −0 is written as 0
            }),
          }));
          const back = parseLas(writeLas({ index: { unit: 'm', values: index }, curves }));
          expect(back.errors).toEqual([]);
          expect(Array.from(back.index.values)).toEqual(index);
          back.curves.forEach((c, k) => expect(Array.from(c.values)).toEqual(curves[k].values));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('refuses what LAS 2.0 cannot hold, with an exact message', () => {
    const index = { unit: 'm' as const, values: [1, 2, 3] };
    expect(() => writeLas({ index, curves: [{ mnemonic: 'GR', values: [1, 2] }] })).toThrow(
      'writeLas: curve GR has 2 values but the index has 3',
    );
    expect(() => writeLas({ index: { unit: 'm', values: [1, 3, 2] }, curves: [] })).toThrow(
      'writeLas: the index must be strictly increasing or decreasing (row 2)',
    );
    expect(() => writeLas({ index: { unit: 'm', values: [1, NaN] }, curves: [] })).toThrow(
      'writeLas: index value NaN at row 1 is not a finite number',
    );
    expect(() => writeLas({ index: { unit: null, values: [1] }, curves: [] })).toThrow(
      "writeLas: the index unit must be 'm' or 'ft', got null",
    );
    expect(() => writeLas({ index, curves: [{ mnemonic: 'G R', values: [1, 2, 3] }] })).toThrow(
      "writeLas: mnemonic 'G R' must be non-empty, without spaces, dots or colons",
    );
    expect(() =>
      writeLas({
        index,
        curves: [
          { mnemonic: 'GR', values: [1, 2, 3] },
          { mnemonic: 'GR', values: [1, 2, 3] },
        ],
      }),
    ).toThrow("writeLas: curve mnemonic 'GR' is used twice");
    expect(() => writeLas({ index, curves: [{ mnemonic: 'GR', description: 'a: b', values: [1, 2, 3] }] })).toThrow(
      'writeLas: the description of curve GR must not contain a colon',
    );
    expect(() => writeLas({ index, curves: [{ mnemonic: 'GR', values: [1, Infinity, 3] }] })).toThrow(
      'writeLas: curve GR has a non-finite value Infinity at row 1',
    );
    expect(() => writeLas({ index, curves: [{ mnemonic: 'GR', values: [1, -999.25, 3] }] })).toThrow(
      'writeLas: curve GR holds the NULL value -999.25 at row 1; choose another NULL',
    );
    expect(() => writeLas({ index, curves: [], other: '~A sneaky' })).toThrow(
      "writeLas: a line of other must not start with ~ or #: '~A sneaky'",
    );
  });
});

describe('formatLasNumber', () => {
  it('writes plain decimals that read back as the same double', () => {
    // LAS 2.0 §3.0: data values are floating point or integer, no exponent notation.
    expect(formatLasNumber(1e-7)).toBe('0.0000001');
    expect(formatLasNumber(-1.5e-10)).toBe('-0.00000000015');
    expect(formatLasNumber(2.5e21)).toBe('2500000000000000000000');
    expect(formatLasNumber(123.456)).toBe('123.456');
    expect(() => formatLasNumber(NaN)).toThrow('formatLasNumber: NaN is not a finite number');
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        const text = formatLasNumber(x);
        expect(text).not.toMatch(/e/i);
        expect(Number(text)).toBe(x === 0 ? 0 : x); // Number() is the ECMAScript reference conversion; −0 prints as 0
      }),
    );
  });
});
