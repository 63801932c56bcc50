import { G } from '../../../../shared/units';
import type { PressureQuality } from '../../../../shared/schemas/wells';
import type { CasingShoe, DrillingContext, MudRecord } from './drilling';
import type { SandBed } from './logs';
import { atTvd } from './physics';
import { observation, pressureEntry, type DemoPressure } from './units';

/**
 * Wireline formation pressure tests, mostly in the permeable sands (so deeper wells, with more sands,
 * have more). Most read the formation pressure within gauge scatter; the rest misbehave the way the
 * trade grades them: supercharged tests read high by a share of the mud overbalance (filtrate has not
 * bled off into a low-permeability sand), tight tests never stabilise and read anything, doubtful ones
 * scatter (common practice, no source; the offsets are invented but of plausible size).
 */
export const TEST_QUALITY_SHARES: Record<Exclude<PressureQuality, 'unknown'>, number> = {
  good: 0.78,
  supercharged: 0.08,
  tight: 0.07,
  doubtful: 0.07,
};

function drawQuality(u: number): Exclude<PressureQuality, 'unknown'> {
  let acc = 0;
  for (const [q, share] of Object.entries(TEST_QUALITY_SHARES) as [Exclude<PressureQuality, 'unknown'>, number][]) {
    acc += share;
    if (u < acc) return q;
  }
  return 'doubtful';
}

/** Mud weight in use (kg/m3) at an MD: the last report at or above it. */
function mudAt(schedule: MudRecord['schedule'], mdM: number): number {
  let emw = schedule[0]?.emwKgM3 ?? 0;
  for (const s of schedule) if (s.mdM <= mdM) emw = s.emwKgM3;
  return emw;
}

/**
 * Formation tests of one well in the logged interval (below `fromTvdM`), sorted by MD.
 * @example
 * formationTests(ctx, beds, mud.schedule, shoes, column.mudlineTvdM + 200);
 */
export function formationTests(
  ctx: DrillingContext,
  beds: readonly SandBed[],
  schedule: MudRecord['schedule'],
  shoes: readonly CasingShoe[],
  fromTvdM: number,
): DemoPressure[] {
  const { column, path, tdTvdM, operator, rng } = ctx;
  const points: { tvdM: number; inSand: boolean }[] = [];
  for (const bed of beds) {
    if (bed.topTvdM < fromTvdM || bed.baseTvdM > tdTvdM - 2 || !rng.chance(0.75)) continue;
    const count = bed.baseTvdM - bed.topTvdM > 15 ? rng.int(1, 3) : 1;
    for (let k = 0; k < count; k++) points.push({ tvdM: bed.topTvdM + (bed.baseTvdM - bed.topTvdM) * rng.uniform(0.2, 0.8), inSand: true });
  }
  // A few attempts in shale-prone intervals: they seal poorly and come back tight or doubtful.
  const shaleTries = Math.round(points.length * 0.1);
  for (let k = 0; k < shaleTries; k++) points.push({ tvdM: rng.uniform(fromTvdM, tdTvdM - 5), inSand: false });

  const out = points.map(({ tvdM: plannedTvdM, inSand }) => {
    const mdM = Math.round(path.mdAtTvd(plannedTvdM) * 10) / 10;
    const tvdM = path.tvdAtMd(mdM);
    const porePa = atTvd(column, column.porePa, tvdM);
    const quality = inSand ? drawQuality(rng.uniform()) : rng.chance(0.7) ? 'tight' : 'doubtful';
    const overbalancePa = Math.max(0, mudAt(schedule, mdM) * G * tvdM - porePa);
    const readPa =
      quality === 'good'
        ? porePa + rng.normal(0, 0.01e6)
        : quality === 'supercharged'
          ? porePa + Math.max(0.15e6, rng.uniform(0.03, 0.1) * overbalancePa)
          : quality === 'tight'
            ? porePa + rng.uniform(-2.0e6, 1.0e6)
            : porePa + rng.normal(0, 0.6e6);
    const run = 1 + shoes.filter((s) => s.mdM < mdM).length;
    const sectionBaseMd = shoes.find((s) => s.mdM > mdM)?.mdM ?? ctx.tdMdM;
    return observation({
      kind: 'formation_test',
      mdM,
      tvdM,
      tvdFromSurvey: ctx.tvdFromSurvey,
      valueEntered: pressureEntry(readPa, operator.pressureUnit),
      unitEntered: operator.pressureUnit,
      quality,
      fluid: inSand ? 'water' : null,
      observedOn: ctx.dateAt(sectionBaseMd),
      source: `wireline formation tester, run ${run}`,
    });
  });
  return out.sort((a, b) => a.mdM - b.mdM);
}
