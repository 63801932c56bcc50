import { describe, expect, it } from 'vitest';
import { fitTrend, trendR2, trendValues } from '@shared/profile';

const mudline = 125;
const tvdM = Float64Array.from({ length: 2000 }, (_, i) => 300 + i);
// A deterministic wiggle (no random numbers, so the test cannot flake) on a known exponential trend.
const wiggle = (i: number) => 4 * Math.sin(i * 0.7) + 2 * Math.cos(i * 0.13);
const dt = tvdM.map((z, i) => 60 + 130 * Math.exp(-4.5e-4 * (z - mudline)) + wiggle(i));
const res = tvdM.map((z, i) => 0.7 * 10 ** (1.2e-4 * (z - mudline)) * Math.exp(0.03 * Math.sin(i)));

// The same trends without the wiggle: the fit must give back the parameters they were built with.
const dtExact = tvdM.map((z) => 60 + 130 * Math.exp(-4.5e-4 * (z - mudline)));
const resExact = tvdM.map((z) => 0.7 * 10 ** (1.2e-4 * (z - mudline)));

/** r² = 1 − SSE/SST by its textbook definition, over the samples in [fromM, toM], on y itself or on log10 y. */
function r2ByHand(values: Float64Array, model: (belowMudlineM: number) => number, fromM: number, toM: number, log = false): number {
  const f = (v: number) => (log ? Math.log10(v) : v);
  const pairs: [number, number][] = [];
  tvdM.forEach((z, i) => {
    if (z >= fromM && z <= toM) pairs.push([f(values[i]), f(model(z - mudline))]);
  });
  const mean = pairs.reduce((sum, [y]) => sum + y, 0) / pairs.length;
  const sse = pairs.reduce((sum, [y, m]) => sum + (y - m) ** 2, 0);
  const sst = pairs.reduce((sum, [y]) => sum + (y - mean) ** 2, 0);
  return 1 - sse / sst;
}

describe('fitTrend', () => {
  it('gives back the parameters of an exact exponential trend, with surface at the mudline (190, not 197.5)', () => {
    // Built as Δt = 60 + 130·exp(−4.5e-4·(z − 125)): at the mudline 190 µs/ft. Fitted on TVD instead of depth below the
    // mudline, the intercept would be 60 + 130·exp(4.5e-4 × 125) = 197.5 µs/ft.
    const fit = fitTrend(
      { tvdM, mudlineTvdM: mudline, values: dtExact },
      { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null },
    );
    expect(fit.params.matrix).toBeCloseTo(60, 3);
    expect(fit.params.surface).toBeCloseTo(190, 3);
    expect(fit.params.cPerM).toBeCloseTo(4.5e-4, 8);
    expect(fit.r2).toBeCloseTo(1, 9);
    expect(fit.n).toBe(1801); // 400 … 2200 m at 1 m, both ends included
  });

  it('gives back the parameters of an exact log-linear trend (Hottmann & Johnson 1965 form log10 R = a + b·z)', () => {
    // Built as R = 0.7·10^(1.2e-4·(z − 125)): a = log10 0.7 = −0.15490196, b = 1.2e-4 /m.
    const fit = fitTrend(
      { tvdM, mudlineTvdM: mudline, values: resExact },
      { model: 'loglinear', fromM: 400, toM: 2200, gammaCutoffApi: null },
    );
    expect(fit.params.a).toBeCloseTo(-0.15490196, 8);
    expect(fit.params.b).toBeCloseTo(1.2e-4, 12);
    expect(fit.r2).toBeCloseTo(1, 12);
  });

  it('on a wiggled log, lands near the built trend', () => {
    const fit = fitTrend({ tvdM, mudlineTvdM: mudline, values: dt }, { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null });
    // The wiggle (amplitude ≤ 6 µs/ft, mean near zero) moves the mudline value a few µs/ft at most off the built 190.
    expect(fit.params.surface).toBeGreaterThan(180);
    expect(fit.params.surface).toBeLessThan(200);
    const l = fitTrend({ tvdM, mudlineTvdM: mudline, values: res }, { model: 'loglinear', fromM: 400, toM: 2200, gammaCutoffApi: null });
    expect(l.params.b).toBeCloseTo(1.2e-4, 5);
  });

  it('trendR2 is r² = 1 − SSE/SST of the given parameters, by hand (exponential on Δt, loglinear on log10 R)', () => {
    const e = { matrix: 55, surface: 195, cPerM: 4e-4 };
    const eR2 = trendR2(
      { tvdM, mudlineTvdM: mudline, values: dt },
      { curve: 'sonic', model: 'exponential', fromM: 400, toM: 2200, params: e, gammaCutoffApi: null },
    );
    expect(eR2.r2).toBeCloseTo(
      r2ByHand(dt, (z) => e.matrix + (e.surface - e.matrix) * Math.exp(-e.cPerM * z), 400, 2200),
      10,
    );
    expect(eR2.n).toBe(1801);
    const l = { a: -0.16, b: 1.25e-4 };
    const lR2 = trendR2(
      { tvdM, mudlineTvdM: mudline, values: res },
      { curve: 'resistivity', model: 'loglinear', fromM: 400, toM: 2200, params: l, gammaCutoffApi: null },
    );
    expect(lR2.r2).toBeCloseTo(
      r2ByHand(res, (z) => 10 ** (l.a + l.b * z), 400, 2200, true),
      10,
    );
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
  it('keeps the given matrix and fits the rest: exact trend with Δt_m = 60 gives back c and the mudline value', () => {
    const fit = fitTrend(
      { tvdM, mudlineTvdM: mudline, values: dtExact },
      { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null, matrixValue: 60 },
    );
    expect(fit.params.matrix).toBe(60);
    expect(fit.params.cPerM).toBeCloseTo(4.5e-4, 8);
    expect(fit.params.surface).toBeCloseTo(190, 3);
  });

  it('a wrong held matrix gives a worse fit than the right one', () => {
    const held = (matrixValue: number) =>
      fitTrend(
        { tvdM, mudlineTvdM: mudline, values: dtExact },
        { model: 'exponential', fromM: 400, toM: 2200, gammaCutoffApi: null, matrixValue },
      );
    expect(held(40).r2).toBeLessThan(held(60).r2);
    expect(held(60).r2).toBeCloseTo(1, 9);
  });
});
