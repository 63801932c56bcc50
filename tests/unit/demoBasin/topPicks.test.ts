import { describe, expect, it } from 'vitest';
import { demoTopPick } from '../../../server/db/seed/demoBasin/writeInterpretations';
import { demo } from './demoData';

describe('seeded automatic TOP picks', () => {
  const basin = demo();
  const picks = basin.wells.map((w) => ({ w, pick: demoTopPick(w) }));

  it('finds a top in every well whose sonic log reaches the hidden top by 100 m or more', () => {
    for (const { w, pick } of picks) {
      const deepEnough = w.tdTvdM - w.airGapM > w.truth.topTvdssM + 100;
      if (deepEnough) expect(pick, w.name).not.toBeNull();
    }
    expect(picks.filter((p) => p.pick).length).toBeGreaterThanOrEqual(45);
  });

  it('sits below the hidden onset of overpressure by a steady offset', () => {
    // The hidden surface is where excess pressure begins; a pick needs the pore pressure to exceed normal
    // by the 0.3 ppg margin, which the gently starting ramp reaches some 100–350 m deeper. The offset is
    // steady across the basin (its spread is small), so the picks map the same surface shifted down.
    const errors = picks.filter((p) => p.pick).map(({ w, pick }) => pick!.tvdM - w.airGapM - w.truth.topTvdssM);
    const mean = errors.reduce((s, e) => s + e, 0) / errors.length;
    const spread = Math.sqrt(errors.reduce((s, e) => s + (e - mean) ** 2, 0) / errors.length);
    expect(Math.min(...errors)).toBeGreaterThan(0);
    expect(mean).toBeGreaterThan(100);
    expect(mean).toBeLessThan(300);
    expect(spread).toBeLessThan(60);
  });
});
