/**
 * Minimum curvature over 20,000 stations and TVD look-ups, against the textbook acos form of the dogleg
 * (Sawaryn & Thorogood 2005, SPE Drill. & Compl. 20(1)) written inline here as the reference.
 */
import { computeSurvey, minimumCurvature, tvdAt, type StationInput } from '../../../shared/trajectory/index';
import { mulberry32 } from '../../../shared/random/mulberry32';
import { timeMedian } from '../helpers/timing';
import type { BenchSection, Row } from '../helpers/types';

const STATIONS = 20_000;
const LOOKUPS = 100_000;
const DEG = Math.PI / 180;

/** A 10 km S-shaped well surveyed every 0.5 m, with small measurement noise. */
function stations(): StationInput[] {
  const random = mulberry32(11);
  const out: StationInput[] = [];
  for (let i = 0; i < STATIONS; i++) {
    const mdM = i * 0.5;
    const inc = mdM < 800 ? 0 : Math.min(55, (mdM - 800) * 0.03) - (mdM > 6000 ? Math.min(40, (mdM - 6000) * 0.02) : 0);
    const azi = 40 + 30 * Math.sin(mdM / 3000);
    out.push({ mdM, incDeg: Math.max(0, inc + 0.05 * (random() - 0.5)), aziDeg: azi + 0.1 * (random() - 0.5) });
  }
  return out;
}

/** Textbook minimum curvature: cos β = cos(I2−I1) − sin I1 sin I2 (1 − cos(A2−A1)), RF = (2/β)tan(β/2). */
function textbook(s: StationInput[]): { tvdM: number; northM: number; eastM: number }[] {
  const out = [{ tvdM: 0, northM: 0, eastM: 0 }];
  // the first station is at MD 0 on the default tie-in, so it sits at the origin
  for (let i = 1; i < s.length; i++) {
    const i1 = s[i - 1].incDeg * DEG,
      i2 = s[i].incDeg * DEG;
    const a1 = s[i - 1].aziDeg * DEG,
      a2 = s[i].aziDeg * DEG;
    const cosB = Math.cos(i2 - i1) - Math.sin(i1) * Math.sin(i2) * (1 - Math.cos(a2 - a1));
    const beta = Math.acos(Math.min(1, Math.max(-1, cosB)));
    const rf = beta === 0 ? 1 : (2 / beta) * Math.tan(beta / 2);
    const half = ((s[i].mdM - s[i - 1].mdM) / 2) * rf;
    const p = out[i - 1];
    out.push({
      northM: p.northM + half * (Math.sin(i1) * Math.cos(a1) + Math.sin(i2) * Math.cos(a2)),
      eastM: p.eastM + half * (Math.sin(i1) * Math.sin(a1) + Math.sin(i2) * Math.sin(a2)),
      tvdM: p.tvdM + half * (Math.cos(i1) + Math.cos(i2)),
    });
  }
  return out;
}

export const section: BenchSection = {
  name: 'trajectory',
  async run(): Promise<Row[]> {
    const survey = stations();
    const objects = timeMedian(() => minimumCurvature(survey), { repeat: 7 });
    const typed = timeMedian(() => computeSurvey(survey), { repeat: 7 });
    const reference = timeMedian(() => textbook(survey), { repeat: 7 });
    let maxDiff = 0;
    for (let i = 0; i < survey.length; i++) {
      const a = objects.result[i];
      const b = reference.result[i];
      maxDiff = Math.max(maxDiff, Math.abs(a.tvdM - b.tvdM), Math.abs(a.northM - b.northM), Math.abs(a.eastM - b.eastM));
    }

    const lastMd = survey[survey.length - 1].mdM;
    const sorted = new Float64Array(LOOKUPS);
    for (let i = 0; i < LOOKUPS; i++) sorted[i] = (i * lastMd) / LOOKUPS;
    const shuffled = sorted.slice();
    const random = mulberry32(5);
    for (let i = shuffled.length - 1; i > 0; i--) {
      const j = Math.floor(random() * (i + 1));
      [shuffled[i], shuffled[j]] = [shuffled[j], shuffled[i]];
    }
    const computed = typed.result;
    const lookSorted = timeMedian(() => tvdAt(computed, sorted), { repeat: 7 });
    const lookShuffled = timeMedian(() => tvdAt(computed, shuffled), { repeat: 7 });
    const fromStations = timeMedian(() => tvdAt(survey, sorted), { repeat: 5 });

    return [
      {
        metric: `minimumCurvature, ${STATIONS.toLocaleString('en')} stations → objects`,
        ours: objects.ms,
        reference: reference.ms,
        unit: 'ms',
        note: 'reference: textbook acos loop',
      },
      {
        metric: 'computeSurvey (typed arrays)',
        ours: typed.ms,
        reference: reference.ms,
        unit: 'ms',
        note: 'reference: textbook acos loop',
      },
      { metric: 'max |Δposition| vs textbook', ours: maxDiff, unit: 'm', note: 'acos loses digits on tiny doglegs' },
      {
        metric: `tvdAt ${LOOKUPS.toLocaleString('en')} sorted MDs (survey given)`,
        ours: lookSorted.ms,
        reference: lookShuffled.ms,
        unit: 'ms',
        note: 'reference: same MDs shuffled (bisection)',
      },
      {
        metric: `tvdAt ${LOOKUPS.toLocaleString('en')} sorted MDs from stations`,
        ours: fromStations.ms,
        unit: 'ms',
        note: 'includes computeSurvey',
      },
    ];
  },
};
