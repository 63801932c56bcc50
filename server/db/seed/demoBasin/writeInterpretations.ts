import { G, PPG_KGM3, eatonSonic, topOfOverpressure } from '../../../../shared/pressure';
import { DEFAULT_SMOOTHING_M, runningMedian } from '../../../../shared/profile';
import type { InterpretationContent } from '../../../../shared/schemas/interpretations';
import type { Db } from '../../client';
import { interpretations } from '../../schema';
import { DEMO_PHYSICS } from './physics';
import { DEMO_TRENDS, normalSlownessUsFt } from './logs';
import type { DemoWell } from './well';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** 0.3 ppg above normal, over at least 50 m: the pick settings a user sees (common practice, no source). */
const MARGIN_KGM3 = 0.3 * PPG_KGM3;
const MIN_THICKNESS_M = 50;
/** Shale samples only: sands read ~42 API in the demo, shales ~88–98 (invented basin values). */
const SHALE_GAMMA_API = 70;

/**
 * The automatic TOP pick an interpreter would get from each demo well's own sonic log: Eaton (1975)
 * with the basin's normal trend on the shale samples (20 m running median, as a new interpretation has), then
 * `topOfOverpressure`. Noise and sands make
 * these picks differ from the hidden surface by metres to tens of metres, as real picks do.
 */
export function demoTopPick(w: DemoWell): InterpretationContent['top'] {
  const dt = w.logs.find((c) => c.role === 'sonic');
  const gr = w.logs.find((c) => c.role === 'gamma');
  if (!dt) return null;
  const s = w.truth.logSamples;
  const n = s.tvdM.length;
  const shale = Float64Array.from(dt.values, (v, i) => (!(v > 0) || (gr && !(gr.values[i] >= SHALE_GAMMA_API)) ? NaN : v));
  const smoothed = runningMedian(s.tvdM, shale, DEFAULT_SMOOTHING_M);
  const pore = new Float64Array(n).fill(NaN);
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(smoothed[i])) continue;
    const belowMudline = s.tvdM[i] - w.truth.column.mudlineTvdM;
    pore[i] = eatonSonic({
      overburdenPa: s.overburdenPa[i],
      normalPa: s.normalPa[i],
      normalSlowness: normalSlownessUsFt(belowMudline),
      observedSlowness: smoothed[i],
      exponent: DEMO_TRENDS.sonic.exponent,
    });
  }
  const top = topOfOverpressure({
    tvdM: s.tvdM,
    porePa: pore,
    normalGradientPaM: DEMO_PHYSICS.brineKgM3 * G,
    marginPaM: MARGIN_KGM3 * G,
    minThicknessM: MIN_THICKNESS_M,
    datumOffsetM: w.airGapM,
  });
  if (!top) return null;
  return {
    tvdM: top.tvdM,
    method: 'auto',
    confidence: 'medium',
    comment: 'Seeded automatic pick from the sonic log (Eaton, basin normal trend, shale samples only, 20 m running median).',
    marginKgM3: MARGIN_KGM3,
    minThicknessM: MIN_THICKNESS_M,
  };
}

/** Version 1, accepted, for every demo well whose sonic log shows a top of overpressure. */
export async function writeDemoInterpretations(tx: Tx, demo: DemoWell[], idOf: Map<string, string>): Promise<number> {
  const rows = demo.flatMap((w) => {
    const top = demoTopPick(w);
    if (!top) return [];
    const t = DEMO_TRENDS.sonic;
    const content: InterpretationContent = {
      normalDensityKgM3: DEMO_PHYSICS.brineKgM3,
      // The basin's normal sonic trend, over the normally pressured section the pick leaves above it.
      trend: {
        curveId: null,
        curve: 'sonic',
        model: 'exponential',
        fromM: Math.round(w.truth.column.mudlineTvdM + 200),
        toM: Math.round(Math.max(w.truth.column.mudlineTvdM + 400, top.tvdM - 100)),
        params: { matrix: t.matrixUsFt, surface: t.mudlineUsFt, cPerM: t.cPerM },
        r2: null,
        gammaCutoffApi: SHALE_GAMMA_API,
      },
      pore: { method: 'eaton-sonic', exponent: t.exponent, smoothingM: DEFAULT_SMOOTHING_M },
      fracture: { method: 'eaton', poissonTop: 0.25, poissonGradientPerKm: 0.05 },
      top,
    };
    return [{ wellId: idOf.get(w.name)!, version: 1, status: 'accepted' as const, content, note: 'Synthetic demo: automatic pick' }];
  });
  if (rows.length) await tx.insert(interpretations).values(rows);
  return rows.length;
}
