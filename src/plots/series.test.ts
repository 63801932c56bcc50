import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3';
import { G } from '@shared/units';
import { curvePoints, mudWeightSteps, pathOf, thinByDepth } from './series';
import { nearestIndex, panDomain, profileLayout, trackDomain, trackScale, valueDomain, zoomDomain } from './frame';
import { wrapLabel } from './legend';
import { compactionReading, excessRatioCurve, formatYears } from './compaction';
import { markStyle } from './styles';

describe('series builders', () => {
  it('mud weights become a step line: each report holds to the next, the last to the base', () => {
    const mud = (tvdM: number, kgM3: number) => ({ kind: 'mud_weight' as const, tvdM, mdM: tvdM + 5, valueSi: kgM3 * G * tvdM });
    const steps = mudWeightSteps([mud(2000, 1200), mud(1000, 1100), { kind: 'lot' as const, tvdM: 900, mdM: 900, valueSi: 1 }], 3000);
    expect(steps.map((s) => [s.tvdM, Math.round(s.kgM3)])).toEqual([
      [1000, 1100],
      [2000, 1100],
      [2000, 1200],
      [3000, 1200],
    ]);
  });

  it('thinning keeps each band’s extremes and the gaps', () => {
    const pts = curvePoints([0, 0.1, 0.2, 0.3, 1, 1.1, 2, 2.1], [5, 9, 1, 5, NaN, NaN, 3, 4]);
    const thin = thinByDepth(pts, 1);
    expect(thin).toEqual([
      [9, 0.1],
      [1, 0.2],
      [NaN, 1],
      [3, 2],
      [4, 2.1],
    ]);
  });

  it('paths break at NaN', () => {
    const s = scaleLinear().domain([0, 10]).range([0, 100]);
    expect(
      pathOf(
        [
          [1, 1],
          [2, 2],
          [NaN, 3],
          [4, 4],
        ],
        s,
        s,
      ),
    ).toBe('M10,10L20,20M40,40Z');
  });
});

describe('scales and zoom', () => {
  it('zooms about the cursor and stays in limits', () => {
    expect(zoomDomain([0, 4000], 2000, 0.5, [0, 4000])).toEqual([1000, 3000]);
    expect(zoomDomain([0, 4000], 0, 0.5, [0, 4000])).toEqual([0, 2000]);
    expect(panDomain([1000, 2000], 2500, [0, 4000])).toEqual([3000, 4000]);
  });

  it('sonic runs right to left; resistivity is logarithmic (2 ohm·m mid-way between 0.2 and 20)', () => {
    const band = { x0: 0, x1: 108 };
    expect(trackScale('sonic', [40, 200], band)(200)).toBe(4);
    expect(trackScale('resistivity', [0.2, 20], band)(2)).toBeCloseTo(54, 9);
    expect(trackDomain('resistivity', Float64Array.of(0.05, 3))).toEqual([0.01, 20]);
  });

  it('value domains are nice and hold the data', () => {
    const [a, b] = valueDomain([Float64Array.of(0.9, 2.07)]);
    expect(a).toBeLessThanOrEqual(0.9);
    expect(b).toBeGreaterThanOrEqual(2.07);
    expect(nearestIndex(Float64Array.of(0, 10, 20), 14)).toBe(1);
    expect(nearestIndex(Float64Array.of(0, 10, 20), 16)).toBe(2);
  });

  it('lays out tracks, plot and legend without overlap', () => {
    const l = profileLayout(1100, 640, ['gamma', 'sonic', 'resistivity', 'density']);
    for (let i = 1; i < l.tracks.length; i++) expect(l.tracks[i].x0).toBeGreaterThan(l.tracks[i - 1].x1);
    expect(l.plot.x0).toBeGreaterThan(l.tracks[3].x1);
    expect(l.plot.x1 - l.plot.x0).toBeGreaterThanOrEqual(300);
    expect(l.legend.x0).toBeGreaterThan(l.plot.x1);
    expect(l.legend.x1).toBeLessThanOrEqual(1100);
  });
});

describe('legend and marks', () => {
  it('wraps at spaces', () => {
    expect(wrapLabel('Formation test (tight, supercharged or doubtful)', 22)).toEqual([
      'Formation test (tight,',
      'supercharged or',
      'doubtful)',
    ]);
  });
  it('good tests are filled, others and FITs hollow', () => {
    expect(markStyle('formation_test', 'good').hollow).toBe(false);
    expect(markStyle('formation_test', 'supercharged').hollow).toBe(true);
    expect(markStyle('fit', 'good').hollow).toBe(true);
    expect(markStyle('kick', 'unknown').hollow).toBe(false);
  });
});

describe('compaction screen reading', () => {
  it('Gibson 1958: small T keeps little excess, large T approaches the full overload at the base', () => {
    const c = excessRatioCurve(1e-3, 1e2, 11);
    expect(c[0].ratio).toBeLessThan(0.1);
    expect(c[10].ratio).toBeGreaterThan(0.85);
    expect(c[10].ratio).toBeGreaterThan(c[5].ratio);
    expect(c[5].T).toBeCloseTo(10 ** -0.5, 9);
  });
  it('says it in words', () => {
    expect(formatYears(34_812)).toBe('~35,000 years');
    expect(formatYears(2.4e6)).toBe('~2.4 million years');
    expect(compactionReading({ tauYears: 3e7, burialYears: 4e6, verdict: 'likely-retained' })).toBe(
      'The layer drains in ~30 million years but was buried over ~4 million years: burial outpaced drainage, so pressure is likely retained.',
    );
  });
});
