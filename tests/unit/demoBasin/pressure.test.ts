import { beforeAll, describe, expect, it } from 'vitest';
import { topOfOverpressure } from '@shared/pressure';
import type { DemoBasin } from '../../../server/db/seed/demoBasin/generate';
import { DEMO_PHYSICS } from '../../../server/db/seed/demoBasin/physics';
import { hiddenTopTvdssM } from '../../../server/db/seed/demoBasin/surfaces';
import { demo, g, PPG } from './demoData';

let basin: DemoBasin;
beforeAll(() => {
  basin = demo();
}, 60_000);

/** Samples of a column strictly below the mudline. */
function sedimentIndices(c: DemoBasin['wells'][number]['truth']['column']): number[] {
  const out: number[] = [];
  for (let i = 0; i < c.tvdM.length; i++) if (c.tvdM[i] > c.mudlineTvdM + 0.5) out.push(i);
  return out;
}

describe('pore pressure', () => {
  it('is a brine column from sea level above the top of overpressure (1030 kg/m3 within 1e-9)', () => {
    // p = ρ·g·h with h from sea level (docs/sources.md [hydrostatic]); basin brine 1030–1070 kg/m3.
    expect(DEMO_PHYSICS.brineKgM3).toBeGreaterThanOrEqual(1030);
    expect(DEMO_PHYSICS.brineKgM3).toBeLessThanOrEqual(1040);
    let worst = 0;
    let samples = 0;
    for (const w of basin.wells) {
      const c = w.truth.column;
      for (const i of sedimentIndices(c)) {
        if (c.tvdM[i] > c.topTvdM) break;
        const emwBelowSeaLevel = c.porePa[i] / (g * (c.tvdM[i] - w.airGapM));
        worst = Math.max(worst, Math.abs(emwBelowSeaLevel - 1030) / 1030);
        samples++;
      }
    }
    expect(samples).toBeGreaterThan(60 * 1000);
    expect(worst).toBeLessThan(1e-9);
  });

  it('is overpressured below the top: more than 0.5 ppg above normal 200 m down, wherever drilled', () => {
    let checked = 0;
    for (const w of basin.wells) {
      const c = w.truth.column;
      const i = Math.round(c.topTvdM + 200);
      if (i >= c.tvdM.length) continue;
      checked++;
      expect(c.porePa[i] - c.normalPa[i]).toBeGreaterThan(0.5 * PPG * g * c.tvdM[i]);
    }
    expect(checked).toBeGreaterThanOrEqual(50);
  });

  it('reaches overpressure of 1.5–1.9 sg EMW in the deepest wells (a deltaic basin, not a pressure vessel)', () => {
    const deepest = basin.wells.map((w) => {
      const c = w.truth.column;
      const i = c.tvdM.length - 2;
      return c.porePa[i] / (g * c.tvdM[i]);
    });
    expect(Math.max(...deepest)).toBeGreaterThan(1500);
    expect(Math.max(...deepest)).toBeLessThan(1900);
  });

  it('stays below fracture pressure, which stays below overburden, everywhere below the mudline', () => {
    const faults: string[] = [];
    for (const w of basin.wells) {
      const c = w.truth.column;
      for (const i of sedimentIndices(c)) {
        if (!(c.porePa[i] < c.fracturePa[i] && c.fracturePa[i] < c.overburdenPa[i])) faults.push(`${w.name} at ${c.tvdM[i]} m`);
      }
    }
    expect(faults).toEqual([]);
  });

  it('uses Eaton (1969) for fracture pressure: F = ν/(1 − ν)·(S − P) + P', () => {
    // Eaton 1969, JPT 21(10), 1353 (SPE 2163), written out here independently of shared/pressure.
    for (const w of basin.wells.slice(0, 10)) {
      const c = w.truth.column;
      for (const i of sedimentIndices(c).filter((_, k) => k % 250 === 0)) {
        const nu = c.poisson[i];
        expect(c.fracturePa[i]).toBeCloseTo((nu / (1 - nu)) * (c.overburdenPa[i] - c.porePa[i]) + c.porePa[i], 3);
      }
    }
  });
});

describe('top of overpressure', () => {
  it('topOfOverpressure on the noise-free pore profile finds the hidden top at the wellhead within one sample', () => {
    // Vertical wells: TVD below the rig floor minus the air gap is TVDSS, where the hidden surface lives.
    const vertical = basin.wells.filter((w) => w.profile === 'vertical');
    let found = 0;
    for (const w of vertical) {
      const c = w.truth.column;
      const top = topOfOverpressure({
        tvdM: c.tvdM,
        porePa: c.porePa,
        normalGradientPaM: DEMO_PHYSICS.brineKgM3 * g,
        marginPaM: 0,
        minThicknessM: 20,
        datumOffsetM: w.airGapM,
      });
      if (c.tvdM[c.tvdM.length - 1] < c.topTvdM + 20) {
        expect(top).toBeNull();
        continue;
      }
      found++;
      expect(top).not.toBeNull();
      expect(Math.abs(top!.tvdM - w.airGapM - hiddenTopTvdssM(w.lon, w.lat))).toBeLessThanOrEqual(DEMO_PHYSICS.stepM);
    }
    expect(found).toBeGreaterThanOrEqual(30);
  });

  it('for directional wells it finds the top where the bore meets the surface', () => {
    for (const w of basin.wells.filter((x) => x.profile !== 'vertical')) {
      const c = w.truth.column;
      const top = topOfOverpressure({
        tvdM: c.tvdM,
        porePa: c.porePa,
        normalGradientPaM: 1030 * g,
        marginPaM: 0,
        minThicknessM: 20,
        datumOffsetM: w.airGapM,
      });
      expect(top).not.toBeNull();
      expect(Math.abs(top!.tvdM - w.airGapM - w.truth.topTvdssM)).toBeLessThanOrEqual(DEMO_PHYSICS.stepM);
    }
  });
});

describe('overburden and compaction', () => {
  it('overburden is the sea plus g·∫ρ dz of the column density (trapezoid sum written out here)', () => {
    for (const w of basin.wells.slice(0, 12)) {
      const c = w.truth.column;
      let s = 1030 * g * w.waterDepthM; // the sea, at the same 1030 kg/m3 as the brine
      let prevZ = c.mudlineTvdM;
      let prevRho = NaN;
      for (let i = 0; i < c.tvdM.length; i++) {
        if (c.tvdM[i] < c.mudlineTvdM) continue;
        const rho = c.densityKgM3[i];
        s += g * (Number.isNaN(prevRho) ? rho : (prevRho + rho) / 2) * (c.tvdM[i] - prevZ);
        prevZ = c.tvdM[i];
        prevRho = rho;
      }
      const last = c.tvdM.length - 1;
      expect(Math.abs(s - c.overburdenPa[last]) / c.overburdenPa[last]).toBeLessThan(1e-9);
    }
  });

  it('has an overburden gradient below the 1 psi/ft rule of thumb at TD, lowest in deep water (0.75–1.0 psi/ft)', () => {
    // 1.0 psi/ft ≈ 22.62 kPa/m is common practice, no source; it overstates offshore columns, where sea
    // water and young undercompacted mud carry less weight, so deep-water wells read lower.
    for (const w of basin.wells) {
      const c = w.truth.column;
      const last = c.tvdM.length - 1;
      const psiPerFt = c.overburdenPa[last] / c.tvdM[last] / 22_620.59;
      expect(psiPerFt).toBeGreaterThan(0.75);
      expect(psiPerFt).toBeLessThan(1.0);
    }
  });

  it('follows Athy porosity with the Sclater & Christie (1980) shale constants above the top', () => {
    // φ = 0.63·exp(−0.51 z[km]) (Athy 1930; Sclater & Christie 1980, JGR 85), grain 2720 kg/m3.
    for (const w of basin.wells.slice(0, 12)) {
      const c = w.truth.column;
      const i = Math.round(c.mudlineTvdM + 1000);
      if (c.tvdM[i] > c.topTvdM) continue;
      const phi = 0.63 * Math.exp((-0.51 * (c.tvdM[i] - c.mudlineTvdM)) / 1000);
      expect(c.porosity[i]).toBeCloseTo(phi, 12);
      expect(c.densityKgM3[i]).toBeCloseTo(phi * 1030 + (1 - phi) * 2720, 8);
    }
  });

  it('keeps porosity high below the top (undercompaction), with effective stress frozen near the top', () => {
    let checked = 0;
    for (const w of basin.wells) {
      const c = w.truth.column;
      const i = Math.round(c.topTvdM + 500);
      if (i >= c.tvdM.length) continue;
      checked++;
      const normalPhi = 0.63 * Math.exp((-0.51 * (c.tvdM[i] - c.mudlineTvdM)) / 1000);
      expect(c.porosity[i]).toBeGreaterThan(normalPhi * 1.05);
      // Porosity never falls below where it stood at the top by more than a little: the rock stopped compacting.
      const atTop = c.porosity[Math.round(c.topTvdM)];
      expect(c.porosity[i]).toBeGreaterThan(atTop - 0.03);
      // σ' = S − P below the top never exceeds its value at the top by more than 15 %.
      const sigmaTop = c.overburdenPa[Math.round(c.topTvdM)] - c.porePa[Math.round(c.topTvdM)];
      expect(c.overburdenPa[i] - c.porePa[i]).toBeLessThan(sigmaTop * 1.15);
    }
    expect(checked).toBeGreaterThanOrEqual(40);
  });
});
