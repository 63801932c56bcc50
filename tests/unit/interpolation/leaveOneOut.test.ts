import { describe, expect, it } from 'vitest';
import { leaveOneOut, ordinaryKriging, type Variogram } from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

// three data on a line: A (0) = 1, B (1) = 2, C (3) = 4
const LINE = [
  { x: 0, y: 0, value: 1 },
  { x: 1, y: 0, value: 2 },
  { x: 3, y: 0, value: 4 },
];

describe('leaveOneOut', () => {
  it('IDW, power 1, computed by hand', () => {
    // A from B, C: (2/1 + 4/3)/(1 + 1/3) = 2.5; B from A, C: (1 + 4/2)/(1 + 1/2) = 2; C from A, B: (1/3 + 1)/(1/3 + 1/2) = 1.6
    const r = leaveOneOut(LINE, { kind: 'idw', power: 1 });
    expect(r.residuals.map((e) => e.predicted)).toEqual([2.5, 2, 1.6].map((v) => expect.closeTo(v, 12)));
    expect(r.residuals.map((e) => e.residual)).toEqual([1.5, 0, -2.4].map((v) => expect.closeTo(v, 12)));
    expect(r.meanError).toBeCloseTo(-0.3, 12);
    expect(r.rmse).toBeCloseTo(Math.sqrt((1.5 ** 2 + 2.4 ** 2) / 3), 12);
    expect(r.residuals[1]).toMatchObject({ index: 1, observed: 2 });
    expect(r.residuals[0].stdDev).toBeUndefined();
  });

  it('kriging, computed by hand with the two-datum closed form', () => {
    // C(h) = e^(−h) (exponential, sill 1, practical range 3). Two data i, j for target 0, solving
    // [1 Cij 1; Cij 1 1; 1 1 0]·[wi; wj; μ] = [ci; cj; 1] by hand: wi = ½ + (ci − cj)/(2(1 − Cij)),
    // μ = ci − wi − wj·Cij, σ² = 1 − wi·ci − wj·cj − μ (Isaaks & Srivastava 1989, ch. 12 system).
    const v: Variogram = { model: 'exponential', nugget: 0, sill: 1, range: 3 };
    const hand = (ci: number, cj: number, cij: number, zi: number, zj: number) => {
      const wi = 0.5 + (ci - cj) / (2 * (1 - cij));
      const wj = 1 - wi;
      const mu = ci - wi - wj * cij;
      return { predicted: wi * zi + wj * zj, variance: 1 - wi * ci - wj * cj - mu };
    };
    const e = Math.exp;
    const expected = [
      hand(e(-1), e(-3), e(-2), 2, 4), // A from B (1 m) and C (3 m), B–C 2 m
      hand(e(-1), e(-2), e(-3), 1, 4), // B from A (1 m) and C (2 m), A–C 3 m
      hand(e(-3), e(-2), e(-1), 1, 2), // C from A (3 m) and B (2 m), A–B 1 m
    ];
    const r = leaveOneOut(LINE, { kind: 'kriging', variogram: v });
    r.residuals.forEach((res, i) => {
      expect(res.predicted).toBeCloseTo(expected[i].predicted, 12);
      expect(res.stdDev!).toBeCloseTo(Math.sqrt(expected[i].variance), 12);
    });
    // one neighbour: w = 1, so the estimate is the nearest datum and σ² = 2(C(0) − C(h))
    const one = leaveOneOut(LINE, { kind: 'kriging', variogram: v, maxNeighbours: 1 });
    expect(one.residuals.map((x) => x.predicted)).toEqual([2, 1, 2].map((x) => expect.closeTo(x, 12)));
    expect(one.residuals[2].stdDev!).toBeCloseTo(Math.sqrt(2 * (1 - e(-2))), 12);
  });

  it('the one-inverse shortcut (Dubrule 1983) equals re-kriging without each datum', () => {
    const random = mulberry32(31);
    const pts = Array.from({ length: 30 }, () => ({ x: random() * 500, y: random() * 500, value: 10 + 5 * random() }));
    const v: Variogram = { model: 'spherical', nugget: 0.3, sill: 2, range: 250 };
    const fast = leaveOneOut(pts, { kind: 'kriging', variogram: v });
    const withNeighbours = leaveOneOut(pts, { kind: 'kriging', variogram: v, maxNeighbours: 8 });
    pts.forEach((p, i) => {
      const others = pts.filter((_, j) => j !== i);
      const [direct] = ordinaryKriging(others, v, [p]);
      expect(fast.residuals[i].predicted).toBeCloseTo(direct.value, 9);
      expect(fast.residuals[i].stdDev!).toBeCloseTo(Math.sqrt(direct.variance), 9);
      const [local] = ordinaryKriging(others, v, [p], { maxNeighbours: 8 });
      expect(withNeighbours.residuals[i].predicted).toBeCloseTo(local.value, 9);
    });
  });

  it('rejects bad input', () => {
    expect(() => leaveOneOut([LINE[0]], { kind: 'idw', power: 2 })).toThrow('Leave-one-out needs at least 2 points, got 1');
    expect(() => leaveOneOut(LINE, { kind: 'spline' } as never)).toThrow('Unknown leave-one-out method: spline');
    expect(() => leaveOneOut(LINE, { kind: 'idw', power: -2 })).toThrow('power must be a finite number > 0, got -2');
  });
});
