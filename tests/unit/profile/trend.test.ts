import { describe, expect, it } from 'vitest';
import { fitNormalTrend } from '@shared/pressure';
import { fitTrend, trendR2, trendValues } from '@shared/profile';

const mudline = 125;
const tvdM = Float64Array.from({ length: 2000 }, (_, i) => 300 + i);
// A deterministic wiggle (no random numbers, so the test cannot flake) on a known exponential trend.
const wiggle = (i: number) => 4 * Math.sin(i * 0.7) + 2 * Math.cos(i * 0.13);
const dt = tvdM.map((z, i) => 60 + 130 * Math.exp(-4.5e-4 * (z - mudline)) + wiggle(i));
const res = tvdM.map((z, i) => 0.7 * 10 ** (1.2e-4 * (z - mudline)) * Math.exp(0.03 * Math.sin(i)));

describe('fitTrend', () => {
  it('fits on depth below the mudline with fitNormalTrend: same parameters and r² as the reference call', () => {
    const fit = fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null });
    const ref = fitNormalTrend(
      tvdM.map((z) => z - mudline),
      dt,
      { model: 'exponential', fromM: 275, toM: 2075 },
    );
    expect(ref.model).toBe('exponential');
    if (ref.model !== 'exponential') return;
    expect(fit.params.surface).toBeCloseTo(ref.params.surface, 9);
    expect(fit.params.cPerM).toBeCloseTo(ref.params.cPerM, 12);
    expect(fit.r2).toBe(ref.r2);
    // and near the trend the wiggle was put on
    expect(fit.params.surface).toBeGreaterThan(180);
    expect(fit.params.surface).toBeLessThan(200);
  });

  it('trendR2 of the fitted parameters reproduces the fitter’s r² (exponential and loglinear)', () => {
    const e = fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null });
    const eR2 = trendR2(
      { tvdM, mudlineTvdM: mudline, values: dt },
      { curve: 'sonic', model: 'exponential', fromM: 400, toM: 2200, params: e.params, gammaCutoffApi: null },
    );
    expect(eR2.r2).toBeCloseTo(e.r2, 10);
    expect(eR2.n).toBe(e.n);
    const l = fitTrend({ tvdM, mudlineTvdM: mudline, values: res }, { model: 'loglinear', fromM: 400, toM: 2200, gammaCutoffApi: null });
    // Hottmann & Johnson 1965 form log10 R = a + b z: the slope comes back near the 1.2e-4 /m put in.
    expect(l.params.b).toBeCloseTo(1.2e-4, 5);
    const lR2 = trendR2(
      { tvdM, mudlineTvdM: mudline, values: res },
      { curve: 'resistivity', model: 'loglinear', fromM: 400, toM: 2200, params: l.params, gammaCutoffApi: null },
    );
    expect(lR2.r2).toBeCloseTo(l.r2, 10);
  });

  it('an edited parameter lowers r²', () => {
    const e = fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null });
    const edited = trendR2(
      { tvdM, mudlineTvdM: mudline, values: dt },
      {
        curve: 'sonic',
        model: 'exponential',
        fromM: 400,
        toM: 2200,
        params: { ...e.params, surface: e.params.surface + 20 },
        gammaCutoffApi: null,
      },
    );
    expect(edited.r2).toBeLessThan(e.r2 - 0.05);
  });

  it('the gamma-ray cut-off leaves sand samples out of the fit', () => {
    const gammaApi = tvdM.map((_, i) => (i % 4 === 0 ? 40 : 90));
    const fit = fitTrend(
      { tvdM, mudlineTvdM: mudline, values: dt, gammaApi },
      { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: 60 },
    );
    const all = fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null });
    expect(fit.n).toBe(all.n - Math.ceil(all.n / 4));
  });

  it('refuses an interval above the mudline', () => {
    expect(() =>
      fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 100, toM: 900, gammaCutoffApi: null }),
    ).toThrow('fitTrend: the trend interval must start at or below the mudline (125 m; got 100 m)');
  });

  it('trendValues is NaN above the mudline and the model below it', () => {
    const v = trendValues({ model: 'loglinear', params: { a: 0, b: 1e-4 } }, [50, 1125], mudline);
    expect(v[0]).toBeNaN();
    expect(v[1]).toBeCloseTo(10 ** 0.1, 12);
  });
});

describe('fitTrend with the matrix held', () => {
  it('passes the matrix value to fitNormalTrend and fits the rest', () => {
    const fit = fitTrend(
      { tvdM, mudlineTvdM: mudline, values: dt },
      { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null, matrixValue: 60 },
    );
    const ref = fitNormalTrend(
      tvdM.map((z) => z - mudline),
      dt,
      { model: 'exponential', fromM: 275, toM: 2075, matrixValue: 60 },
    );
    expect(fit.params.matrix).toBe(60);
    expect(ref.model === 'exponential' && fit.params.cPerM).toBeCloseTo(ref.model === 'exponential' ? ref.params.cPerM : NaN, 12);
  });
});
