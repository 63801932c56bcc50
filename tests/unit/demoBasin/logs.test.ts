import { beforeAll, describe, expect, it } from 'vitest';
import { eatonResistivity, eatonSonic, fitNormalTrend } from '@shared/pressure';
import type { DemoBasin } from '../../../server/db/seed/demoBasin/generate';
import { DEMO_TRENDS, normalResistivityOhmM, normalSlownessUsFt } from '../../../server/db/seed/demoBasin/logs';
import type { DemoWell } from '../../../server/db/seed/demoBasin/well';
import { cleanDemo, demo, g } from './demoData';

let clean: DemoBasin;
let noisy: DemoBasin;
beforeAll(() => {
  clean = cleanDemo();
  noisy = demo();
}, 120_000);

const curve = (w: DemoWell, mnemonic: string) => w.logs.find((c) => c.mnemonic === mnemonic)!.values;
const below = (w: DemoWell) => w.truth.logSamples.tvdM.map((z) => z - w.truth.column.mudlineTvdM);

describe('logs against Eaton (1975, SPE 5544)', () => {
  it('sonic: Eaton with the generator’s normal trend gives back the pore pressure to 1e-6 (noise off)', () => {
    let worst = 0;
    for (const w of clean.wells) {
      const s = w.truth.logSamples;
      const pore = eatonSonic({
        overburdenPa: s.overburdenPa,
        normalPa: s.normalPa,
        normalSlowness: below(w).map(normalSlownessUsFt),
        observedSlowness: curve(w, 'DT'),
      });
      for (let i = 0; i < pore.length; i++) worst = Math.max(worst, Math.abs(pore[i] - s.porePa[i]) / s.porePa[i]);
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('resistivity: Eaton with exponent 1.2 and the log-linear trend gives back the pore pressure (noise off)', () => {
    let worst = 0;
    for (const w of clean.wells) {
      const s = w.truth.logSamples;
      const pore = eatonResistivity({
        overburdenPa: s.overburdenPa,
        normalPa: s.normalPa,
        normalResistivity: below(w).map(normalResistivityOhmM),
        observedResistivity: curve(w, 'RDEP'),
        exponent: 1.2,
      });
      for (let i = 0; i < pore.length; i++) worst = Math.max(worst, Math.abs(pore[i] - s.porePa[i]) / s.porePa[i]);
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('the log pore pressure is the column’s at the same TVD (MD-indexed logs, TVD from the path)', () => {
    const w = clean.wells.find((x) => x.profile === 'vertical')!;
    const s = w.truth.logSamples;
    for (let i = 0; i < s.mdM.length; i += 97) {
      expect(s.tvdM[i]).toBe(s.mdM[i]);
      expect(s.porePa[i]).toBe(w.truth.column.porePa[s.tvdM[i]]);
    }
  });

  it('fitNormalTrend on the shale sonic above the top recovers the normal compaction trend', () => {
    // Δt_n(z) = Δt_m + (Δt_ml − Δt_m)·exp(−c·z), z below the mudline (docs/sources.md [nct]).
    const w = clean.wells.find((x) => x.profile === 'vertical' && x.truth.column.topTvdM - x.truth.column.mudlineTvdM > 2500)!;
    const z = below(w);
    const topBelow = w.truth.column.topTvdM - w.truth.column.mudlineTvdM;
    const trend = fitNormalTrend(z, curve(w, 'DT'), { model: 'exponential', fromM: 200, toM: topBelow - 10 });
    if (trend.model !== 'exponential') throw new Error('expected an exponential trend');
    expect(trend.params.matrix).toBeCloseTo(DEMO_TRENDS.sonic.matrixUsFt, 2);
    expect(trend.params.surface).toBeCloseTo(DEMO_TRENDS.sonic.mudlineUsFt, 1);
    expect(trend.params.cPerM).toBeCloseTo(DEMO_TRENDS.sonic.cPerM, 7);
  });

  it('undercompaction shows as slowness above the normal trend below the top', () => {
    for (const w of clean.wells) {
      const s = w.truth.logSamples;
      const dt = curve(w, 'DT');
      const z = below(w);
      const i = s.tvdM.findIndex((t) => t > w.truth.column.topTvdM + 300);
      if (i < 0) continue;
      expect(dt[i]).toBeGreaterThan(normalSlownessUsFt(z[i]) * 1.03);
    }
  });
});

describe('density, gamma ray and noise', () => {
  it('RHOB is the density that made the overburden: g·∫RHOB dTVD equals the overburden increase', () => {
    for (const w of clean.wells.filter((x) => x.profile === 'vertical').slice(0, 8)) {
      const s = w.truth.logSamples;
      const rhob = curve(w, 'RHOB');
      let integral = 0;
      for (let i = 1; i < rhob.length; i++) integral += ((rhob[i] + rhob[i - 1]) / 2) * 1000 * g * (s.tvdM[i] - s.tvdM[i - 1]);
      const rise = s.overburdenPa[s.tvdM.length - 1] - s.overburdenPa[0];
      expect(Math.abs(integral - rise) / rise).toBeLessThan(1e-3);
    }
  });

  it('logs start about 200 m below the mudline and run to TD at 1 m or 0.5 ft steps', () => {
    const steps = new Set<number>();
    for (const w of noisy.wells) {
      const md = w.logs[0].mdM;
      const step = Math.round((md[1] - md[0]) * 1e4) / 1e4;
      steps.add(step);
      expect(w.truth.logSamples.tvdM[0] - w.truth.column.mudlineTvdM).toBeGreaterThan(199);
      expect(w.truth.logSamples.tvdM[0] - w.truth.column.mudlineTvdM).toBeLessThan(202);
      expect(w.tdMdM - md[md.length - 1]).toBeLessThan(step + 1e-6);
      expect(w.logs.map((c) => c.role)).toEqual(['sonic', 'resistivity', 'density', 'gamma']);
    }
    expect([...steps].sort()).toEqual([0.1524, 1]); // 0.5 ft = 0.1524 m exactly
  });

  it('sands read low on gamma ray and sonic; shales near 90–100 API', () => {
    let sandGr = 0;
    let sandN = 0;
    let shaleGr = 0;
    let shaleN = 0;
    for (const w of noisy.wells.slice(0, 20)) {
      const gr = curve(w, 'GR');
      const tvd = w.truth.logSamples.tvdM;
      for (let i = 0; i < gr.length; i++) {
        const inSand = w.truth.sands.some((b) => tvd[i] > b.topTvdM + 1 && tvd[i] < b.baseTvdM - 1);
        const nearSand = w.truth.sands.some((b) => tvd[i] > b.topTvdM - 3 && tvd[i] < b.baseTvdM + 3);
        if (inSand) {
          sandGr += gr[i];
          sandN++;
        } else if (!nearSand) {
          shaleGr += gr[i];
          shaleN++;
        }
      }
    }
    expect(sandN).toBeGreaterThan(1000);
    expect(sandGr / sandN).toBeLessThan(50);
    expect(shaleGr / shaleN).toBeGreaterThan(85);
    expect(shaleGr / shaleN).toBeLessThan(100);
  });

  it('adds seeded measurement noise of about 1 % to the sonic, absent when noise is off', () => {
    const w = noisy.wells[0];
    const c = clean.wells[0];
    const sands = w.truth.sands;
    const tvd = w.truth.logSamples.tvdM;
    let sq = 0;
    let n = 0;
    const dtN = curve(w, 'DT');
    const dtC = curve(c, 'DT');
    for (let i = 0; i < dtN.length; i++) {
      if (sands.some((b) => tvd[i] > b.topTvdM - 2 && tvd[i] < b.baseTvdM + 2)) continue;
      sq += ((dtN[i] - dtC[i]) / dtC[i]) ** 2;
      n++;
    }
    const rms = Math.sqrt(sq / n);
    expect(rms).toBeGreaterThan(0.005);
    expect(rms).toBeLessThan(0.03);
  });
});
