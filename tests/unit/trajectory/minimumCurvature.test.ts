import { describe, expect, it } from 'vitest';
import { computeSurvey, minimumCurvature } from '@shared/trajectory/index';

const FT = 0.3048; // international foot, exact
const DEG = Math.PI / 180;

describe('minimumCurvature', () => {
  it('reproduces the widely published 3500 ft → 3600 ft example', () => {
    // Minimum curvature (Taylor & Mason 1972; formulas as in Sawaryn & Thorogood 2005, SPE Drill. & Compl. 20(1)):
    // the widely reproduced example 3500 ft, 15°, 20° → 3600 ft, 25°, 45° gives ΔN ≈ 27.22 ft, ΔE ≈ 19.45 ft,
    // ΔTVD ≈ 94.01 ft (values recalled from memory; the exact-arc test below checks the method independently).
    const tieIn = { mdM: 3500 * FT, tvdM: 3000 * FT, northM: 100 * FT, eastM: -50 * FT, incDeg: 15, aziDeg: 20 };
    const [a, b] = minimumCurvature(
      [
        { mdM: 3500 * FT, incDeg: 15, aziDeg: 20 },
        { mdM: 3600 * FT, incDeg: 25, aziDeg: 45 },
      ],
      tieIn,
    );
    expect(a.tvdM).toBe(tieIn.tvdM);
    expect((b.northM - a.northM) / FT).toBeCloseTo(27.22, 2);
    expect((b.eastM - a.eastM) / FT).toBeCloseTo(19.45, 2);
    expect((b.tvdM - a.tvdM) / FT).toBeCloseTo(94.01, 2);
    // dogleg from the textbook form cos β = cos(I2−I1) − sin I1 sin I2 (1 − cos(A2−A1)) (Sawaryn & Thorogood 2005)
    const cosBeta = Math.cos(10 * DEG) - Math.sin(15 * DEG) * Math.sin(25 * DEG) * (1 - Math.cos(25 * DEG));
    const betaDeg = Math.acos(cosBeta) / DEG;
    expect(b.doglegDegPer30m).toBeCloseTo((betaDeg / (100 * FT)) * 30, 10);
    expect(a.doglegDegPer30m).toBe(0);
  });

  it('puts a constant-build planar arc exactly on its circle, R = 180/(π·BUR)', () => {
    // Exact geometry of a circular build section (Sawaryn & Thorogood 2005: minimum curvature is exact for arcs):
    // with build rate BUR (deg/m) from vertical at the kick-off, R = 180/(π·BUR), TVD = KOP + R·sin I,
    // horizontal departure R·(1 − cos I) along the fixed azimuth.
    const kopM = 500;
    const burDegPerM = 3 / 30;
    const R = 180 / (Math.PI * burDegPerM);
    const azi = 135;
    const stations = [{ mdM: kopM, incDeg: 0, aziDeg: azi }];
    for (let md = kopM + 30; md <= kopM + 900; md += 30) stations.push({ mdM: md, incDeg: (md - kopM) * burDegPerM, aziDeg: azi });
    const result = minimumCurvature(stations);
    for (const s of result) {
      const inc = s.incDeg * DEG;
      const departure = R * (1 - Math.cos(inc));
      const expected = { tvdM: kopM + R * Math.sin(inc), northM: departure * Math.cos(azi * DEG), eastM: departure * Math.sin(azi * DEG) };
      const scale = Math.max(1, s.mdM);
      // the brief asks for 1e-6 relative; the method is exact on arcs, so hold it to 1e-9
      expect(Math.abs(s.tvdM - expected.tvdM) / scale).toBeLessThan(1e-9);
      expect(Math.abs(s.northM - expected.northM) / scale).toBeLessThan(1e-9);
      expect(Math.abs(s.eastM - expected.eastM) / scale).toBeLessThan(1e-9);
      if (s.mdM > kopM) expect(s.doglegDegPer30m).toBeCloseTo(3, 10);
    }
    expect(result[result.length - 1].incDeg).toBeCloseTo(90, 10); // 900 m at 3°/30 m lands horizontal
  });

  it('computes the arc from a vertical default tie-in to a deeper first station', () => {
    // Exact circle again: from vertical at MD 0 to 20° at MD 200 m, R = 200/β
    const [s] = minimumCurvature([{ mdM: 200, incDeg: 20, aziDeg: 90 }]);
    const beta = 20 * DEG;
    const R = 200 / beta;
    expect(s.tvdM).toBeCloseTo(R * Math.sin(beta), 9);
    expect(s.eastM).toBeCloseTo(R * (1 - Math.cos(beta)), 9);
    expect(s.northM).toBeCloseTo(0, 9);
    expect(s.doglegDegPer30m).toBeCloseTo((20 / 200) * 30, 10);
  });

  it('keeps a vertical well vertical: TVD = MD', () => {
    const result = minimumCurvature([0, 250, 1000, 2750.5].map((mdM) => ({ mdM, incDeg: 0, aziDeg: 77 })));
    for (const s of result) {
      expect(s.tvdM).toBe(s.mdM);
      expect(s.northM).toBe(0);
      expect(s.eastM).toBe(0);
      expect(s.doglegDegPer30m).toBe(0);
    }
  });

  it('follows a straight inclined hold: TVD = MD·cos I, departure = MD·sin I', () => {
    const inc = 37.5;
    const azi = 300;
    const tieIn = { mdM: 0, tvdM: 0, northM: 0, eastM: 0, incDeg: inc, aziDeg: azi };
    const result = minimumCurvature(
      [100, 400, 1000].map((mdM) => ({ mdM, incDeg: inc, aziDeg: azi })),
      tieIn,
    );
    for (const s of result) {
      expect(s.tvdM).toBeCloseTo(s.mdM * Math.cos(inc * DEG), 9);
      expect(s.northM).toBeCloseTo(s.mdM * Math.sin(inc * DEG) * Math.cos(azi * DEG), 9);
      expect(s.eastM).toBeCloseTo(s.mdM * Math.sin(inc * DEG) * Math.sin(azi * DEG), 9);
      expect(s.doglegDegPer30m).toBeCloseTo(0, 12);
    }
  });

  it('normalises azimuths to [0, 360) and treats 350° and −10° alike', () => {
    const a = minimumCurvature([
      { mdM: 0, incDeg: 0, aziDeg: 0 },
      { mdM: 100, incDeg: 30, aziDeg: -10 },
      { mdM: 200, incDeg: 30, aziDeg: 720 },
    ]);
    const b = minimumCurvature([
      { mdM: 0, incDeg: 0, aziDeg: 0 },
      { mdM: 100, incDeg: 30, aziDeg: 350 },
      { mdM: 200, incDeg: 30, aziDeg: 0 },
    ]);
    expect(a.map((s) => s.aziDeg)).toEqual([0, 350, 0]);
    for (let i = 0; i < 3; i++) {
      expect(a[i].northM).toBeCloseTo(b[i].northM, 9);
      expect(a[i].eastM).toBeCloseTo(b[i].eastM, 9);
      expect(a[i].tvdM).toBeCloseTo(b[i].tvdM, 9);
    }
  });

  it('stays accurate on doglegs far below a microradian, where acos(cos β) cannot', () => {
    // two stations 1e-7° apart in inclination over 30 m: the hold formula is the limit (RF → 1 + β²/12)
    const i1 = 45;
    const i2 = 45 + 1e-7;
    const [, s] = minimumCurvature(
      [
        { mdM: 0, incDeg: i1, aziDeg: 0 },
        { mdM: 30, incDeg: i2, aziDeg: 0 },
      ],
      { mdM: 0, tvdM: 0, northM: 0, eastM: 0, incDeg: i1, aziDeg: 0 },
    );
    const beta = (i2 - i1) * DEG;
    // the textbook acos form rounds cos β to 1 here and reports no dogleg at all
    expect(Math.acos(Math.cos(i2 * DEG - i1 * DEG))).toBe(0);
    // trigonometry of 45° carries ~1e-16 absolute error, i.e. ~1e-7 relative on a 2e-9 rad dogleg
    expect(Math.abs(s.doglegDegPer30m / (i2 - i1) - 1)).toBeLessThan(1e-6);
    expect(s.tvdM).toBeCloseTo(15 * (Math.cos(i1 * DEG) + Math.cos(i2 * DEG)) * (1 + (beta * beta) / 12), 12);
  });

  it('handles 20,000 stations and returns them all', () => {
    const stations = Array.from({ length: 20_000 }, (_, i) => ({ mdM: i * 0.5, incDeg: Math.min(60, i * 0.005), aziDeg: 10 + i * 0.001 }));
    const survey = computeSurvey(stations);
    expect(survey.nodeCount).toBe(20_000);
    // positions are cumulative sums of chords: each step is no longer than its arc
    for (let k = 1; k < survey.nodeCount; k++) {
      const chord = Math.hypot(
        survey.tvdM[k] - survey.tvdM[k - 1],
        survey.northM[k] - survey.northM[k - 1],
        survey.eastM[k] - survey.eastM[k - 1],
      );
      expect(chord).toBeLessThanOrEqual(0.5 + 1e-12);
    }
  });
});

describe('minimumCurvature input checks', () => {
  const ok = { mdM: 100, incDeg: 10, aziDeg: 20 };
  it.each([
    [[{ ...ok, mdM: Number.NaN }], 'Station 0: mdM must be a finite number, got NaN'],
    [[{ ...ok, incDeg: 181 }], 'Station 0: incDeg must be within [0, 180] degrees, got 181'],
    [[{ ...ok, incDeg: -1 }], 'Station 0: incDeg must be within [0, 180] degrees, got -1'],
    [[{ ...ok, aziDeg: Number.POSITIVE_INFINITY }], 'Station 0: aziDeg must be a finite number, got Infinity'],
    [[ok, { ...ok, mdM: 100 }], 'Station 1: mdM must be strictly increasing (100 then 100)'],
    [[ok, { ...ok, mdM: 50 }], 'Station 1: mdM must be strictly increasing (100 then 50)'],
    [[{ ...ok, mdM: -5 }], 'Station 0: mdM (-5) is above the tie-in mdM (0)'],
  ])('rejects %j', (stations, message) => {
    expect(() => minimumCurvature(stations)).toThrow(message);
  });

  it('rejects a bad tie-in and a reversing direction', () => {
    expect(() => minimumCurvature([ok], { mdM: 0, tvdM: Number.NaN, northM: 0, eastM: 0 })).toThrow(
      'tieIn.tvdM must be a finite number, got NaN',
    );
    expect(() => minimumCurvature([ok], { mdM: 0, tvdM: 0, northM: 0, eastM: 0, incDeg: 200 })).toThrow(
      'tieIn.incDeg must be within [0, 180] degrees, got 200',
    );
    expect(() =>
      minimumCurvature([
        { mdM: 10, incDeg: 0, aziDeg: 0 },
        { mdM: 20, incDeg: 180, aziDeg: 0 },
      ]),
    ).toThrow('Between station 0 and station 1 the direction reverses (dogleg 180°): no minimum-curvature arc exists');
    expect(() => minimumCurvature('x' as never)).toThrow('stations must be an array');
  });
});
