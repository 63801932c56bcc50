import { describe, expect, it } from 'vitest';
import { fitNormalTrend, G } from '@shared/pressure';
import { buildProfile, shareBelowNormal, type BuildProfileInput } from '@shared/profile';
import { PSI_PA } from '@shared/units';

// An offshore well: rotary table 25 m above the sea, 100 m of water, so the mudline is 125 m below the datum.
const well = { datumElevationM: 25, waterDepthM: 100, airGapM: 25 };
const SEA = 1025; // seawater used by the overburden, kg/m3 (shared/pressure OVERBURDEN_DEFAULTS)
const BRINE = 1030;
const RHO = 2200; // a constant density log, kg/m3

/** Log samples every metre from the mudline to 3000 m TVD. */
const tvdM = Float64Array.from({ length: 3000 - 125 + 1 }, (_, i) => 125 + i);

/** Hand-computed vertical stress for the constant-density column: sea from the air gap, then 2200 kg/m3. */
const overburdenByHand = (z: number) => SEA * G * 100 + RHO * G * (z - 125);
const normalByHand = (z: number) => BRINE * G * (z - 25);

// Trend of the constructed sonic log, on depth below the mudline (invented values of plausible size).
const trendParams = { matrix: 60, surface: 190, cPerM: 4.5e-4 };
const dtNormal = (z: number) => trendParams.matrix + (trendParams.surface - trendParams.matrix) * Math.exp(-trendParams.cPerM * (z - 125));

/** A known pore profile: normal down to 2000 m, then 0.9 of the way from normal to 85 % of overburden over 600 m. */
function knownPore(z: number): number {
  const pn = normalByHand(z);
  if (z <= 2000) return pn;
  const w = Math.min(1, (z - 2000) / 600) * 0.9;
  return pn + w * (0.85 * overburdenByHand(z) - pn);
}

/** Sonic built by inverting Eaton 1975 (SPE 5544) on the known pore pressure: Δt = Δt_n·((S − Pn)/(S − P))^(1/3). */
const dt = tvdM.map((z) => dtNormal(z) * ((overburdenByHand(z) - normalByHand(z)) / (overburdenByHand(z) - knownPore(z))) ** (1 / 3));

function input(overrides: Partial<BuildProfileInput> = {}): BuildProfileInput {
  return {
    well,
    tvdM,
    logs: { sonicUsFt: dt, densityKgM3: new Float64Array(tvdM.length).fill(RHO) },
    interpretation: {
      normalDensityKgM3: BRINE,
      trend: { curve: 'sonic', model: 'exponential', fromM: 600, toM: 1900, params: trendParams, gammaCutoffApi: null },
      pore: { method: 'eaton-sonic', exponent: 3 },
      fracture: { method: 'eaton', poissonTop: 0.25, poissonGradientPerKm: 0 },
    },
    ...overrides,
  };
}

const indexOf = (p: { tvdM: Float64Array }, z: number) => p.tvdM.findIndex((v) => v === z);

describe('buildProfile: hydrostatic and overburden', () => {
  const p = buildProfile(input());

  it('fills samples above the log from the surface, with the mudline as one of them', () => {
    expect(p.tvdM[0]).toBe(0);
    expect(indexOf(p, 125)).toBeGreaterThan(0);
    expect(p.tvdM[p.tvdM.length - 1]).toBe(3000);
  });

  it('hydrostatic is one brine column from sea level: ρ·g·(TVD − air gap)', () => {
    for (const z of [25, 500, 2999]) expect(p.hydrostaticPa[indexOf(p, z)]).toBeCloseTo(normalByHand(z), 3);
    expect(p.hydrostaticPa[indexOf(p, 10)]).toBe(0);
  });

  it('overburden carries the water column, then the density log (S = ρw·g·h_w + ρb·g·(z − mudline))', () => {
    // Hand-computed: at 2125 m, 1025·9.80665·100 + 2200·9.80665·2000 = 1,005,181.6 + 43,149,260 Pa.
    expect(p.overburdenPa[indexOf(p, 2125)]).toBeCloseTo(1_005_181.625 + 43_149_260, 0);
    for (const z of [125, 1000, 3000]) expect(p.overburdenPa[indexOf(p, z)]).toBeCloseTo(overburdenByHand(z), 2);
    // Through the sea: seawater from the air gap down (sea at 75 m TVD is 50 m of water).
    expect(p.overburdenPa[indexOf(p, 70)]).toBeCloseTo(SEA * G * 45, 3);
  });

  it('uses the compaction trend where there is no density log, and says so', () => {
    const q = buildProfile(input({ logs: { sonicUsFt: dt } }));
    expect(q.densityFromLog[indexOf(q, 1000)]).toBe(0);
    // Sclater & Christie (1980) shale φ0 = 0.63, c = 0.51/km, grain 2720 kg/m3, brine 1030:
    // at 1000 m below the mudline φ = 0.63·e^−0.51 = 0.37828 → ρ = 0.37828·1030 + 0.62172·2720 = 2080.7 kg/m3.
    expect(q.densityKgM3[indexOf(q, 1125)]).toBeCloseTo(2080.7, 0);
    expect(q.notes.join(' ')).toMatch(/No density log/);
  });
});

describe('buildProfile: pore pressure, fracture and top', () => {
  const p = buildProfile(input());

  it('Eaton on the constructed sonic log gives back the known pore profile', () => {
    for (const z of [800, 1900, 2300, 2800, 3000]) {
      expect(p.porePa![indexOf(p, z)] / knownPore(z)).toBeCloseTo(1, 9);
    }
  });

  it('the normal trend on the grid is the exponential of its parameters', () => {
    expect(p.normalTrend![indexOf(p, 125)]).toBeCloseTo(190, 9);
    expect(p.normalTrend![indexOf(p, 1125)]).toBeCloseTo(60 + 130 * Math.exp(-0.45), 9);
    // the constructed log lies exactly on its trend in the normal interval
    expect(p.trendFit!.r2).toBeCloseTo(1, 9);
  });

  it('fracture by Eaton 1969 with ν = 0.25 is (1/3)(S − P) + P', () => {
    const i = indexOf(p, 2600);
    const s = overburdenByHand(2600);
    const pp = knownPore(2600);
    expect(p.fracturePa![i] / ((s - pp) / 3 + pp)).toBeCloseTo(1, 8);
  });

  it('suggests the top where the known excess first passes 0.3 ppg of EMW: 2031 m', () => {
    // Hand computation on the constructed profile (no code under test): the excess P − Pn = 0.9·(z − 2000)/600·(0.85·S − Pn)
    // against the margin 0.3 ppg·g·z = 0.3 × 119.826427 × 9.80665 × z = 352.52875 Pa/m × z (1 ppg = 119.826427 kg/m³,
    // NIST SP 811 pound and US gallon). At 2030 m: 699,161 Pa against 715,633 Pa (below); at 2031 m: 722,850 Pa against
    // 715,986 Pa (above), and the excess grows faster than the margin below that, so the 50 m run starts at 2031 m.
    expect(p.suggestedTop!.tvdM).toBe(2031);
    expect(p.tvdM[p.suggestedTop!.index]).toBe(2031);
  });

  it('reports the misfit to good formation tests and ignores others', () => {
    const z = 2400;
    const observations = [
      { kind: 'formation_test' as const, quality: 'good' as const, tvdM: z, valueSi: knownPore(z) + 1e6 },
      { kind: 'formation_test' as const, quality: 'good' as const, tvdM: 1500, valueSi: knownPore(1500) - 1e6 },
      { kind: 'formation_test' as const, quality: 'tight' as const, tvdM: 1600, valueSi: 0 },
      { kind: 'lot' as const, quality: 'good' as const, tvdM: 1000, valueSi: 20e6 },
    ];
    const q = buildProfile(input({ observations }));
    expect(q.poreMisfit!.n).toBe(2);
    // model − measured = −1 MPa and +1 MPa: mean 0, RMS 1 MPa.
    expect(q.poreMisfit!.meanPa).toBeCloseTo(0, 3);
    expect(q.poreMisfit!.rmsPa).toBeCloseTo(1e6, 3);
    // as EMW: −1e6/(g·2400) and +1e6/(g·1500) kg/m3
    expect(q.poreMisfit!.meanKgM3).toBeCloseTo((-1e6 / (G * 2400) + 1e6 / (G * 1500)) / 2, 6);
    expect(q.fractureMisfit!.n).toBe(1);
    expect(q.fractureMisfit!.meanPa).toBeCloseTo(q.fracturePa![indexOf(q, 1000)] - 20e6, 3);
  });

  it('with a gamma-ray cut-off, sands get no log pore pressure but the filled curve bridges them', () => {
    const gammaApi = tvdM.map((z) => (z >= 2400 && z < 2420 ? 40 : 95));
    const q = buildProfile(
      input({
        logs: { sonicUsFt: dt, densityKgM3: new Float64Array(tvdM.length).fill(RHO), gammaApi },
        interpretation: { ...input().interpretation, trend: { ...input().interpretation.trend!, gammaCutoffApi: 70 } },
      }),
    );
    const i = indexOf(q, 2410);
    expect(q.porePa![i]).toBeNaN();
    const below = indexOf(q, 2399);
    const above = indexOf(q, 2420);
    expect(q.poreFilledPa![i]).toBeCloseTo(q.porePa![below] + (11 / 21) * (q.porePa![above] - q.porePa![below]), 3);
  });

  it('a running median over the log takes single-sample spikes out before Eaton', () => {
    // Cycle-skip spikes: every 37th sample reads 40 µs/ft slow; with a 20 m window each spike is one sample of ~21.
    const spiky = dt.map((v, i) => (i % 37 === 0 ? v + 40 : v));
    const raw = buildProfile(input({ logs: { sonicUsFt: spiky, densityKgM3: new Float64Array(tvdM.length).fill(RHO) } }));
    const base = input().interpretation;
    const smooth = buildProfile(
      input({
        logs: { sonicUsFt: spiky, densityKgM3: new Float64Array(tvdM.length).fill(RHO) },
        interpretation: { ...base, pore: { method: 'eaton-sonic', exponent: 3, smoothingM: 20 } },
      }),
    );
    const spikeDepth = tvdM[37 * 30];
    const i = indexOf(raw, spikeDepth);
    // Eaton 1975, SPE 5544, on the constructed log: the spike alone reads far above the known pore pressure…
    expect(raw.porePa![i] / knownPore(spikeDepth)).toBeGreaterThan(1.1);
    // …and after the median it reads the known value within the curvature of a 20 m window of a smooth log.
    expect(smooth.porePa![i] / knownPore(spikeDepth)).toBeCloseTo(1, 2);
  });

  it('says why there is no pore curve when the method lacks its trend', () => {
    const q = buildProfile(input({ interpretation: { ...input().interpretation, trend: null } }));
    expect(q.porePa).toBeNull();
    expect(q.notes.join(' ')).toMatch(/needs a normal compaction trend fitted on the sonic log/);
    expect(q.suggestedTop).toBeNull();
  });

  it('Bowers loading needs no trend', () => {
    const q = buildProfile(
      input({
        interpretation: {
          ...input().interpretation,
          trend: null,
          pore: { method: 'bowers', v0: 5000, A: 4.4561, B: 0.8168, unloading: null },
        },
      }),
    );
    expect(Number.isFinite(q.porePa![indexOf(q, 2000)])).toBe(true);
  });

  it('warns in plain words when Bowers puts pore pressure below hydrostatic over much of the log', () => {
    // Sonic built from Bowers 1995 loading (V = V0 + A·σ^B, ft/s and psi) on a pore curve that is normal to 1000 m
    // and 60 kg/m³ of EMW below normal under it, so the same coefficients give that curve back.
    const bowers = { v0: 5000, A: 4.4561, B: 0.8168 };
    const low = (z: number) => normalByHand(z) - (z > 1000 ? 60 * G * z : 0);
    const sonic = tvdM.map((z) => 1e6 / (bowers.v0 + bowers.A * ((overburdenByHand(z) - low(z)) / PSI_PA) ** bowers.B));
    const q = buildProfile(
      input({
        logs: { sonicUsFt: sonic, densityKgM3: new Float64Array(tvdM.length).fill(RHO) },
        interpretation: { ...input().interpretation, trend: null, pore: { method: 'bowers', ...bowers, unloading: null } },
      }),
    );
    expect(q.porePa![indexOf(q, 2000)]).toBeCloseTo(low(2000), -2);
    // Samples 126–3000 m carry a pore value; 1001–3000 m of them are below: 2000 / 2875 = 70 %.
    expect(q.notes).toContain(
      "Pore pressure from Bowers is below hydrostatic over 70 % of the logged interval: calibrate A and B to this basin's formation tests.",
    );
    expect(q.notes.some((n) => n.startsWith('Fracture pressure is below hydrostatic'))).toBe(false);
  });

  it('no below-hydrostatic note for a normally pressured or overpressured curve', () => {
    expect(p.notes.some((n) => n.includes('below hydrostatic'))).toBe(false);
  });

  it('shareBelowNormal counts samples more than the margin of EMW below normal', () => {
    const z = Float64Array.of(0, 1000, 2000, 3000);
    const normal = z.map((v) => 1030 * G * v);
    const curve = Float64Array.of(0, 1030 * G * 1000, 990 * G * 2000, NaN);
    expect(shareBelowNormal(z, curve, normal, 36)).toEqual({ fraction: 0.5, count: 2 });
  });

  it('rejects unsorted depths with an exact message', () => {
    expect(() => buildProfile(input({ tvdM: [500, 400], logs: {} }))).toThrow(
      'buildProfile: tvdM must be sorted ascending (tvdM[1] = 400 after 500)',
    );
  });
});

describe('buildProfile: a well with no logs', () => {
  it('still has hydrostatic, a compaction overburden and the fracture curve at normal pore pressure, down to TD', () => {
    const p = buildProfile({
      well,
      tvdM: [],
      logs: {},
      baseTvdM: 2000,
      interpretation: { normalDensityKgM3: BRINE, trend: null, pore: null, fracture: { method: 'matthews-kelly', ki: 0.5 } },
    });
    expect(p.tvdM[p.tvdM.length - 1]).toBe(2000);
    const i = p.tvdM.length - 1;
    // ρ·g·(TVD − air gap) = 1030 × 9.80665 × (2000 − 25) = 19,949,177.7625 Pa.
    expect(p.hydrostaticPa[i]).toBeCloseTo(19_949_177.7625, 3);
    // Matthews & Kelly 1967: F = Ki (S − P) + P
    expect(p.fracturePa![i]).toBeCloseTo(0.5 * (p.overburdenPa[i] - p.hydrostaticPa[i]) + p.hydrostaticPa[i], 3);
  });
});

describe('trend fit used by the builder', () => {
  it('fitNormalTrend on the constructed normal interval recovers the parameters (sanity of the reference)', () => {
    const below = tvdM.map((z) => z - 125);
    const fit = fitNormalTrend(below, dt, { model: 'exponential', fromM: 475, toM: 1775 });
    expect(fit.model === 'exponential' && fit.params.surface).toBeCloseTo(190, 3);
  });
});
