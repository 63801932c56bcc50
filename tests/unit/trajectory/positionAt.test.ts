import { describe, expect, it } from 'vitest';
import { computeSurvey, positionAt, tvdAt } from '@shared/trajectory/index';

const DEG = Math.PI / 180;

/** Unit tangent (north, east, down). */
function tangent(incDeg: number, aziDeg: number): [number, number, number] {
  return [Math.sin(incDeg * DEG) * Math.cos(aziDeg * DEG), Math.sin(incDeg * DEG) * Math.sin(aziDeg * DEG), Math.cos(incDeg * DEG)];
}

/**
 * Exact point on a circular arc (Frenet geometry, independent of the ratio-factor formula): from P1 with unit
 * tangent t1 towards t2 over arc length L, R = L/β, the point at arc length s is
 * P1 + R·sin(s/R)·t1 + R·(1 − cos(s/R))·n with n = (t2 − t1 cos β)/sin β the unit normal towards the centre.
 */
function exactArcPoint(
  p1: [number, number, number],
  t1: [number, number, number],
  t2: [number, number, number],
  L: number,
  s: number,
): [number, number, number] {
  const cosB = t1[0] * t2[0] + t1[1] * t2[1] + t1[2] * t2[2];
  const beta = Math.acos(cosB);
  const R = L / beta;
  const n = t2.map((v, i) => (v - t1[i] * cosB) / Math.sin(beta));
  const th = s / R;
  return [0, 1, 2].map((i) => p1[i] + R * Math.sin(th) * t1[i] + R * (1 - Math.cos(th)) * n[i]) as [number, number, number];
}

describe('tvdAt / positionAt', () => {
  it('is TVD = MD with no stations (vertical well from the surface)', () => {
    expect(tvdAt([], 1234.5)).toBe(1234.5);
    expect(Array.from(tvdAt([], [0, 10, 2000]))).toEqual([0, 10, 2000]);
  });

  it('lands on the exact circle at mid-arc of a 3-D arc (azimuth and inclination both change)', () => {
    const s1 = { mdM: 1000, incDeg: 20, aziDeg: 30 };
    const s2 = { mdM: 1090, incDeg: 35, aziDeg: 60 };
    const tieIn = { mdM: 1000, tvdM: 950, northM: 120, eastM: 40, incDeg: 20, aziDeg: 30 };
    const survey = computeSurvey([s1, s2], tieIn);
    for (const f of [0.1, 0.5, 0.77, 1]) {
      const md = s1.mdM + f * 90;
      const exact = exactArcPoint([120, 40, 950], tangent(20, 30), tangent(35, 60), 90, f * 90);
      const p = positionAt(survey, md);
      expect(p.northM).toBeCloseTo(exact[0], 9);
      expect(p.eastM).toBeCloseTo(exact[1], 9);
      expect(p.tvdM).toBeCloseTo(exact[2], 9);
    }
  });

  it('matches the build circle between stations, where a linear blend of stations would not', () => {
    // build 3°/30 m from vertical at 500 m, stations every 30 m; exact TVD = KOP + R·sin(BUR·(MD − KOP))
    const bur = 3 / 30;
    const R = 180 / (Math.PI * bur);
    const stations = [];
    for (let md = 500; md <= 1400; md += 30) stations.push({ mdM: md, incDeg: (md - 500) * bur, aziDeg: 10 });
    const mds = [515, 733, 1001, 1399.9];
    const tvd = tvdAt(stations, mds);
    mds.forEach((md, i) => expect(tvd[i]).toBeCloseTo(500 + R * Math.sin((md - 500) * bur * DEG), 9));
    // the linear blend of the two stations around MD 1001 misses by millimetres: the check can tell them apart
    const lo = tvdAt(stations, 980);
    const hi = tvdAt(stations, 1010);
    const linear = lo + ((1001 - 980) / 30) * (hi - lo);
    expect(Math.abs(linear - (500 + R * Math.sin(501 * bur * DEG)))).toBeGreaterThan(1e-3);
  });

  it('extrapolates straight beyond the last station and above the tie-in', () => {
    const stations = [
      { mdM: 100, incDeg: 0, aziDeg: 0 },
      { mdM: 200, incDeg: 30, aziDeg: 90 },
    ];
    const last = positionAt(stations, 200);
    const beyond = positionAt(stations, 350);
    expect(beyond.tvdM - last.tvdM).toBeCloseTo(150 * Math.cos(30 * DEG), 10);
    expect(beyond.eastM - last.eastM).toBeCloseTo(150 * Math.sin(30 * DEG), 10);
    expect(beyond.northM - last.northM).toBeCloseTo(0, 10);
    // between the tie-in (MD 0) and the first station the well is vertical
    expect(tvdAt(stations, 60)).toBe(60);
    const tieIn = { mdM: 500, tvdM: 480, northM: 0, eastM: 0, incDeg: 60, aziDeg: 0 };
    const above = positionAt([{ mdM: 600, incDeg: 60, aziDeg: 0 }], 400, tieIn);
    expect(above.tvdM).toBeCloseTo(480 - 100 * Math.cos(60 * DEG), 10);
    expect(above.northM).toBeCloseTo(-100 * Math.sin(60 * DEG), 10);
  });

  it('gives the same answers for sorted, shuffled and single look-ups, and hits stations exactly', () => {
    const stations = Array.from({ length: 200 }, (_, i) => ({ mdM: i * 15, incDeg: Math.min(80, i * 0.6), aziDeg: 20 + i * 0.4 }));
    const survey = computeSurvey(stations);
    const mds = Array.from({ length: 500 }, (_, i) => -20 + i * 6.2);
    const sorted = tvdAt(survey, mds);
    const shuffledMds = mds.map((md, i) => ({ md, i })).sort((a, b) => Math.sin(a.md * 7.1) - Math.sin(b.md * 7.1));
    const shuffled = tvdAt(
      survey,
      shuffledMds.map((e) => e.md),
    );
    shuffledMds.forEach((e, j) => expect(shuffled[j]).toBe(sorted[e.i]));
    mds.slice(0, 50).forEach((md, i) => expect(tvdAt(survey, md)).toBe(sorted[i]));
    stations.forEach((s, i) => expect(tvdAt(survey, s.mdM)).toBeCloseTo(survey.tvdM[i], 9));
  });

  it('rejects a non-finite MD', () => {
    expect(() => tvdAt([], Number.NaN)).toThrow('mdM must be a finite number, got NaN');
    expect(() => tvdAt([], [1, Number.POSITIVE_INFINITY])).toThrow('mdM[1] must be a finite number, got Infinity');
  });
});
