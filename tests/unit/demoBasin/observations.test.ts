import { beforeAll, describe, expect, it } from 'vitest';
import { tvdAt } from '@shared/trajectory';
import type { DemoBasin } from '../../../server/db/seed/demoBasin/generate';
import { atTvd } from '../../../server/db/seed/demoBasin/physics';
import type { DemoWell } from '../../../server/db/seed/demoBasin/well';
import { demo, g, PPG } from './demoData';

let basin: DemoBasin;
beforeAll(() => {
  basin = demo();
}, 60_000);

const poreEmw = (w: DemoWell, tvdM: number) => atTvd(w.truth.column, w.truth.column.porePa, tvdM) / (g * tvdM);
const fracEmw = (w: DemoWell, tvdM: number) => atTvd(w.truth.column, w.truth.column.fracturePa, tvdM) / (g * tvdM);
const all = () => basin.wells.flatMap((w) => w.pressures.map((p) => ({ w, p })));

describe('kicks, losses and mud weights', () => {
  it('has 3–5 kicks and 3–5 losses across the basin', () => {
    const kicks = all().filter(({ p }) => p.kind === 'kick');
    const losses = all().filter(({ p }) => p.kind === 'loss');
    expect(kicks.length).toBeGreaterThanOrEqual(3);
    expect(kicks.length).toBeLessThanOrEqual(5);
    expect(losses.length).toBeGreaterThanOrEqual(3);
    expect(losses.length).toBeLessThanOrEqual(5);
  });

  it('keeps mud above pore pressure except where the well kicked, mostly by the 0.3–0.5 ppg trip margin', () => {
    // Trip margin 0.2–0.5 ppg above pore pressure: common practice, no source (docs/sources.md [margins]).
    let below = 0;
    let withMargin = 0;
    let total = 0;
    for (const w of basin.wells) {
      const kickMds = w.pressures.filter((p) => p.kind === 'kick').map((p) => p.mdM);
      for (const p of w.pressures.filter((x) => x.kind === 'mud_weight')) {
        total++;
        const pore = poreEmw(w, p.tvdM);
        if (p.emwKgM3 <= pore) {
          below++;
          expect(kickMds).toContain(p.mdM);
        }
        if (p.emwKgM3 >= pore + 0.3 * PPG - 1e-6) withMargin++;
      }
    }
    expect(below).toBe(all().filter(({ p }) => p.kind === 'kick').length);
    expect(withMargin / total).toBeGreaterThan(0.9);
  });

  it('keeps mud below fracture pressure except where mud was lost', () => {
    for (const w of basin.wells) {
      const lossMds = w.pressures.filter((p) => p.kind === 'loss').map((p) => p.mdM);
      for (const p of w.pressures.filter((x) => x.kind === 'mud_weight')) {
        if (p.emwKgM3 >= fracEmw(w, p.tvdM)) expect(lossMds).toContain(p.mdM);
      }
    }
  });

  it('records a kick where pore pressure passed the mud, and a loss where the mud passed fracture', () => {
    for (const { w, p } of all()) {
      if (p.kind === 'kick') {
        const mud = w.pressures.find((m) => m.kind === 'mud_weight' && m.mdM === p.mdM)!;
        expect(p.emwKgM3).toBeGreaterThan(mud.emwKgM3);
        expect(Math.abs(p.pressurePa - poreEmw(w, p.tvdM) * g * p.tvdM)).toBeLessThan(0.3e6);
      }
      if (p.kind === 'loss') expect(p.emwKgM3).toBeGreaterThan(fracEmw(w, p.tvdM));
    }
  });

  it('steps mud weights up within the hole, never down except after a loss', () => {
    for (const w of basin.wells) {
      const mud = w.pressures.filter((p) => p.kind === 'mud_weight');
      const lossMds = new Set(w.pressures.filter((p) => p.kind === 'loss').map((p) => p.mdM));
      for (let i = 1; i < mud.length; i++) {
        if (lossMds.has(mud[i - 1].mdM)) continue;
        expect(mud[i].emwKgM3).toBeGreaterThanOrEqual(mud[i - 1].emwKgM3 - 1e-9);
      }
    }
  });
});

describe('casing shoes and leak-off tests', () => {
  it('has 3–4 casing points per well, each with a shoe test', () => {
    for (const w of basin.wells) {
      expect(w.truth.shoes.length).toBeGreaterThanOrEqual(3);
      expect(w.truth.shoes.length).toBeLessThanOrEqual(4);
      expect(w.pressures.filter((p) => p.kind === 'lot' || p.kind === 'fit')).toHaveLength(w.truth.shoes.length);
    }
  });

  it('keeps the mud under the last shoe test, except in the wells that kicked or lost mud', () => {
    // The shoe test sets the maximum mud weight of the next hole section (docs/sources.md [shoe-test]).
    for (const w of basin.wells) {
      if (w.pressures.some((p) => p.kind === 'kick' || p.kind === 'loss')) continue;
      const tests = w.pressures.filter((p) => p.kind === 'lot' || p.kind === 'fit');
      for (const m of w.pressures.filter((p) => p.kind === 'mud_weight')) {
        const last = tests.filter((t) => t.mdM <= m.mdM).pop()!;
        expect(m.emwKgM3).toBeLessThanOrEqual(last.emwKgM3);
      }
    }
  });

  it('leak-off tests match the fracture gradient within a few percent; integrity tests stop below it', () => {
    let lots = 0;
    for (const { w, p } of all()) {
      if (p.kind === 'lot') {
        lots++;
        expect(Math.abs(p.emwKgM3 / fracEmw(w, p.tvdM) - 1)).toBeLessThan(0.04);
      }
      if (p.kind === 'fit') expect(p.emwKgM3).toBeLessThan(fracEmw(w, p.tvdM));
    }
    expect(lots).toBeGreaterThan(120);
  });
});

describe('formation pressure tests', () => {
  it('are mostly good and in sands, with some tight, supercharged and doubtful tests', () => {
    const tests = all().filter(({ p }) => p.kind === 'formation_test');
    const share = (q: string) => tests.filter(({ p }) => p.quality === q).length / tests.length;
    expect(share('good')).toBeGreaterThan(0.6);
    for (const q of ['tight', 'supercharged', 'doubtful']) expect(share(q)).toBeGreaterThan(0.02);
    const inSand = tests.filter(({ w, p }) => w.truth.sands.some((b) => p.tvdM >= b.topTvdM && p.tvdM <= b.baseTvdM));
    expect(inSand.length / tests.length).toBeGreaterThan(0.85);
  });

  it('good tests read the formation pressure within gauge scatter; supercharged tests read high', () => {
    for (const { w, p } of all()) {
      if (p.kind !== 'formation_test') continue;
      const truePa = atTvd(w.truth.column, w.truth.column.porePa, p.tvdM);
      if (p.quality === 'good') expect(Math.abs(p.pressurePa - truePa)).toBeLessThan(0.06e6);
      if (p.quality === 'supercharged') expect(p.pressurePa).toBeGreaterThan(truePa + 0.1e6);
    }
  });

  it('are more numerous in deeper wells', () => {
    const byDepth = [...basin.wells].sort((a, b) => a.tdTvdM - a.waterDepthM - (b.tdTvdM - b.waterDepthM));
    const count = (ws: DemoWell[]) => ws.reduce((n, w) => n + w.pressures.filter((p) => p.kind === 'formation_test').length, 0) / ws.length;
    expect(count(byDepth.slice(30))).toBeGreaterThan(count(byDepth.slice(0, 30)));
  });
});

describe('units as entered', () => {
  it('vary by operator (psi, kPa, bar, MPa; ppg, sg, kg/m3) while the SI values are right', () => {
    const units = new Set(all().map(({ p }) => p.unitEntered));
    expect([...units].sort()).toEqual(['MPa', 'bar', 'kPa', 'kg/m3', 'ppg', 'psi', 'sg']);
    // Conversions written out from the handbook factors, not through shared/units:
    // 1 psi = 6894.757293168361 Pa (lb·g/in²), 1 ppg = 1000/8.345404 kg/m3 (docs/sources.md [units]).
    const toPa: Record<string, number> = { psi: 6894.757293168361, kPa: 1e3, bar: 1e5, MPa: 1e6 };
    const toKgM3: Record<string, number> = { ppg: PPG, sg: 1000, 'kg/m3': 1 };
    for (const { p } of all()) {
      if (p.unitEntered in toPa) {
        expect(p.pressurePa / (p.valueEntered * toPa[p.unitEntered])).toBeCloseTo(1, 9);
      } else {
        expect(p.emwKgM3 / (p.valueEntered * toKgM3[p.unitEntered])).toBeCloseTo(1, 6);
      }
      expect(p.emwKgM3).toBeCloseTo(p.pressurePa / (g * p.tvdM), 6);
    }
  });
});

describe('depths: MD and TVD', () => {
  it('directional wells carry TVD from the survey (minimum curvature), vertical wells TVD = MD', () => {
    for (const w of basin.wells) {
      const rows = [...w.pressures, ...w.tops];
      if (w.profile === 'vertical') {
        expect(w.survey).toBeNull();
        expect(w.tdTvdM).toBe(w.tdMdM);
        for (const r of rows) {
          expect(r.tvdFromSurvey).toBe(false);
          expect(r.tvdM).toBe(r.mdM);
        }
        continue;
      }
      const stations = w.survey!;
      expect(tvdAt(stations, w.tdMdM)).toBeCloseTo(w.tdTvdM, 6);
      expect(w.tdMdM).toBeGreaterThan(w.tdTvdM);
      for (const r of rows) {
        expect(r.tvdFromSurvey).toBe(true);
        expect(r.tvdM).toBeCloseTo(tvdAt(stations, r.mdM), 6);
        expect(r.tvdM).toBeLessThanOrEqual(r.mdM + 1e-9);
      }
    }
  });

  it('has survey stations every 30 m that lie on circular arcs in the build sections', () => {
    // A constant-azimuth build at a constant rate is a circle in a vertical plane: between stations
    // ΔTVD = R·(sin I2 − sin I1) with R = ΔMD/ΔI (docs/sources.md [min-curvature]: a planar arc must match the exact circle).
    for (const w of basin.wells.filter((x) => x.survey)) {
      const st = w.survey!;
      for (let i = 1; i < st.length; i++) {
        const dMd = st[i].mdM - st[i - 1].mdM;
        expect(dMd).toBeLessThanOrEqual(30 + 1e-9);
        expect(st[i].doglegDegPer30m).toBeLessThan(3.5);
        const dInc = ((st[i].incDeg - st[i - 1].incDeg) * Math.PI) / 180;
        if (Math.abs(dInc) < 1e-6) continue;
        const r = dMd / dInc;
        const i1 = (st[i - 1].incDeg * Math.PI) / 180;
        const i2 = (st[i].incDeg * Math.PI) / 180;
        expect(st[i].tvdM - st[i - 1].tvdM).toBeCloseTo(r * (Math.sin(i2) - Math.sin(i1)), 6);
      }
    }
  });
});

describe('formation tops', () => {
  it('has 5–7 invented formations, met in their stratigraphic order, with lithology', () => {
    const names = basin.basin.formations.map((f) => f.name);
    expect(names.length).toBeGreaterThanOrEqual(5);
    expect(names.length).toBeLessThanOrEqual(7);
    // Shallow wells stop before the deeper units; most wells reach at least five of them.
    expect(basin.wells.filter((w) => w.tops.length >= 5).length).toBeGreaterThan(45);
    for (const w of basin.wells) {
      expect(w.tops.length).toBeGreaterThanOrEqual(3);
      expect(w.tops.map((t) => t.name)).toEqual(names.slice(0, w.tops.length));
      for (let i = 1; i < w.tops.length; i++) expect(w.tops[i].tvdM).toBeGreaterThan(w.tops[i - 1].tvdM);
      for (const t of w.tops) {
        expect(t.lithology.length).toBeGreaterThan(5);
        expect(t.tvdM).toBeLessThan(w.tdTvdM);
        expect(t.tvdM).toBeGreaterThan(w.airGapM + w.waterDepthM);
      }
    }
  });
});
