import { describe, expect, it } from 'vitest';
import { convert, emw, hydrostatic } from '@shared/pressure';

const ppg = (v: number) => convert(v, 'ppg', 'kg/m3');
const ft = (v: number) => convert(v, 'ft', 'm');
const psi = (v: number) => convert(v, 'psi', 'Pa');

describe('hydrostatic', () => {
  it('matches the oilfield formula p[psi] = 0.051948 · MW[ppg] · TVD[ft]', () => {
    // docs/sources.md [emw]: 10 ppg at 10,000 ft → 0.051948 × 10 × 10,000 = 5194.8 psi.
    const p = hydrostatic(ft(10_000), ppg(10));
    expect(convert(p, 'Pa', 'psi')).toBeCloseTo((12 / 231) * 10 * 10_000, 6);
    expect(convert(p, 'Pa', 'psi')).toBeCloseTo(5194.8, 1);
  });

  it('starts the column at the pressure datum', () => {
    // Sea level 25 m below the rig floor: p = ρ g (z − 25), zero above; 1025 kg/m3 × 9.80665 × 1000 m = 10,051,816.25 Pa.
    const p = hydrostatic([0, 10, 25, 1025], 1025, { datumOffsetM: 25 });
    expect(p).toBeInstanceOf(Float64Array);
    expect(Array.from(p.slice(0, 3))).toEqual([0, 0, 0]);
    expect(p[3]).toBeCloseTo(10_051_816.25, 4);
  });

  it('takes one density per sample', () => {
    const p = hydrostatic([1000, 2000], [1000, 1100]);
    expect(p[0]).toBeCloseTo(1000 * 9.80665 * 1000, 6);
    expect(p[1]).toBeCloseTo(1100 * 9.80665 * 2000, 6);
  });

  it('rejects bad input with exact messages', () => {
    expect(() => hydrostatic(-1, 1000)).toThrow(new Error('hydrostatic: tvdM must be >= 0 (got -1)'));
    expect(() => hydrostatic([0, NaN], 1000)).toThrow(new Error('hydrostatic: tvdM[1] must be a finite number (got NaN)'));
    expect(() => hydrostatic([1, 2], [1000, 1000, 1000])).toThrow(
      new Error('hydrostatic: fluidDensityKgM3 has length 3 but tvdM has length 2'),
    );
    expect(() => hydrostatic(1, 1000, { datumOffsetM: NaN })).toThrow(
      new Error('hydrostatic: datumOffsetM must be a finite number (got NaN)'),
    );
  });
});

describe('emw', () => {
  it('inverts the oilfield formula', () => {
    // docs/sources.md [emw]: EMW = p / (0.051948 × TVD): 5194.8 psi at 10,000 ft → 10.000 ppg.
    const rho = emw(psi(5194.8), ft(10_000));
    expect(convert(rho, 'kg/m3', 'ppg')).toBeCloseTo(5194.8 / ((12 / 231) * 10_000), 9);
    expect(convert(rho, 'kg/m3', 'ppg')).toBeCloseTo(10, 3);
  });

  it('works on curves, NaN at the datum and for missing pressures', () => {
    const rho = emw([0, NaN, 9806.65 * 1000], [0, 500, 1000]);
    expect(rho).toBeInstanceOf(Float64Array);
    expect(Number.isNaN(rho[0])).toBe(true); // EMW undefined at TVD 0
    expect(Number.isNaN(rho[1])).toBe(true); // missing sample stays missing
    expect(rho[2]).toBeCloseTo(1000, 9); // 1 g/cc column (ρ g z / (g z))
  });

  it('rejects negative depth', () => {
    expect(() => emw(1e6, [100, -5])).toThrow(new Error('emw: tvdM[1] must be >= 0 (got -5)'));
  });
});
