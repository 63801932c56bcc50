import { PPG_KGM3 } from '../../../../shared/units';
import type { DemoOperator } from './names';
import type { WellPath } from './path';
import { atTvd, emwAt, type PressureColumn } from './physics';
import type { Rng } from './prng';
import { mudEntry, mudEntryKgM3, observation, pressureEntry, type DemoPressure } from './units';

/**
 * How the demo wells were drilled: casing points, leak-off tests at the shoes, and the mud weights in
 * use, stepped up to stay a trip margin above pore pressure and below fracture pressure. Chosen wells
 * take a kick (the mud lagged behind a pressure ramp) or lose mud (a mud weight above fracture).
 */
export const DRILLING_RULES = {
  /** Mud above pore pressure, drawn per well in 0.3–0.5 ppg (common practice, no source). */
  tripMarginPpg: [0.3, 0.5] as const,
  /** A new casing point once the mud would come within this of the last shoe's leak-off (common practice, no source). */
  kickTolerancePpg: 0.3,
  /** How far ahead of the bit the plan looks when it sets the mud weight, m TVD. */
  lookAheadM: 100,
  /** Mud reports every this many metres of hole. */
  reportEveryM: 100,
  /** Leak-off tests are run on this much new hole below the shoe, m. */
  ratHoleM: 4,
  maxShoes: 4,
  minShoes: 3,
} as const;

const CASING_SIZES = ['20 in', '13 3/8 in', '9 5/8 in', '7 in'];

export interface CasingShoe {
  mdM: number;
  tvdM: number;
  size: string;
}

export interface DrillingPlan {
  /** Kick well: from this TVD the mud is not raised until the hole flows. */
  kickFromTvdM?: number;
  /** Loss well: the first report at or below this TVD carries a mud weight above fracture. */
  lossAtTvdM?: number;
}

export interface DrillingContext {
  column: PressureColumn;
  path: WellPath;
  tdMdM: number;
  tdTvdM: number;
  operator: DemoOperator;
  rng: Rng;
  tvdFromSurvey: boolean;
  dateAt(mdM: number): string;
}

const ppg = (x: number) => x * PPG_KGM3;

/** Largest pore EMW over a TVD interval, sampled every 5 m and at both ends. */
function maxPoreEmw(column: PressureColumn, fromTvdM: number, toTvdM: number): number {
  let m = emwAt(column, column.porePa, fromTvdM);
  for (let z = fromTvdM + 5; z < toTvdM; z += 5) m = Math.max(m, emwAt(column, column.porePa, z));
  return Math.max(m, emwAt(column, column.porePa, toTvdM));
}

/**
 * Casing shoes (TVD): surface casing 450–700 m below the mudline, then a new string wherever the mud
 * the plan needs would come within the kick tolerance of the last shoe's fracture EMW, filled up to
 * three strings (one just above the top of overpressure when it is drilled, as planners do).
 * @example chooseShoes(ctx, 0.4 * PPG_KGM3).map((s) => s.size); // ['20 in', '13 3/8 in', '9 5/8 in']
 */
export function chooseShoes(ctx: DrillingContext, tripMarginKgM3: number): CasingShoe[] {
  const { column, path, tdTvdM, rng } = ctx;
  const r = DRILLING_RULES;
  const tvds = [column.mudlineTvdM + rng.uniform(450, 700)];
  const last = () => tvds[tvds.length - 1];
  for (let z = last() + 10; z < tdTvdM - 150 && tvds.length < r.maxShoes; z += 10) {
    const need = maxPoreEmw(column, z, Math.min(tdTvdM, z + r.lookAheadM)) + tripMarginKgM3;
    if (need + ppg(r.kickTolerancePpg) > emwAt(column, column.fracturePa, last()) && z - 10 - last() > 300) tvds.push(z - 10);
  }
  const aboveTop = column.topTvdM - rng.uniform(60, 150);
  const fits = (z: number) => tvds.every((t) => Math.abs(t - z) > 300) && z < tdTvdM - 200;
  if (tvds.length < r.maxShoes && fits(aboveTop) && aboveTop > tvds[0]) tvds.push(aboveTop);
  while (tvds.length < r.minShoes) {
    const sorted = [...tvds].sort((a, b) => a - b).concat(tdTvdM);
    let gap = 0;
    for (let i = 1; i < sorted.length; i++) if (sorted[i] - sorted[i - 1] > sorted[gap + 1] - sorted[gap]) gap = i - 1;
    tvds.push((sorted[gap] + sorted[gap + 1]) / 2);
  }
  return tvds
    .sort((a, b) => a - b)
    .map((t, i) => {
      const mdM = Math.round(path.mdAtTvd(t) * 10) / 10;
      return { mdM, tvdM: path.tvdAtMd(mdM), size: CASING_SIZES[i] };
    });
}

/**
 * A leak-off test (now and then a formation integrity test) on the rat hole below each shoe. A FIT
 * stops at a preset pressure: the heaviest mud planned below the shoe plus 0.3–0.6 ppg, kept under
 * leak-off (common practice, no source).
 * @example shoeTests(ctx, shoes, mud.schedule)[0].kind; // 'lot'
 */
export function shoeTests(ctx: DrillingContext, shoes: CasingShoe[], schedule: MudRecord['schedule']): DemoPressure[] {
  const { column, path, operator, rng } = ctx;
  return shoes.map((shoe, k) => {
    const mdM = shoe.mdM + DRILLING_RULES.ratHoleM;
    const tvdM = path.tvdAtMd(mdM);
    const fracture = emwAt(column, column.fracturePa, tvdM);
    const nextShoeMd = shoes[k + 1]?.mdM ?? Infinity;
    const planned = schedule.filter((s) => s.mdM > shoe.mdM && s.mdM < nextShoeMd).reduce((m, s) => Math.max(m, s.emwKgM3), 0);
    const fit = rng.chance(0.15) && planned + ppg(0.6) < fracture - ppg(0.2);
    // A LOT finds the fracture EMW within test scatter.
    const emw = fit ? planned + ppg(rng.uniform(0.3, 0.6)) : fracture * (1 + rng.normal(0, 0.01));
    return observation({
      kind: fit ? 'fit' : 'lot',
      mdM,
      tvdM,
      tvdFromSurvey: ctx.tvdFromSurvey,
      valueEntered: mudEntry(emw, operator.mudUnit),
      unitEntered: operator.mudUnit,
      quality: 'good',
      observedOn: ctx.dateAt(mdM),
      source: `${fit ? 'formation integrity' : 'leak-off'} test below the ${shoe.size} shoe`,
    });
  });
}

export interface MudRecord {
  observations: DemoPressure[];
  /** Mud weight in use (kg/m3) from each report's MD down to the next. */
  schedule: { mdM: number; emwKgM3: number }[];
}

/**
 * Mud weights in use every 100 m of hole below the surface casing, each a trip margin above the highest
 * pore EMW expected before the next report, never lowered; plus the kick or the loss the plan asks for.
 * @example
 * const { observations, schedule } = mudWeights(ctx, 0.4 * PPG_KGM3, shoes, { kickFromTvdM: 2900 });
 */
export function mudWeights(ctx: DrillingContext, tripMarginKgM3: number, shoes: CasingShoe[], plan: DrillingPlan): MudRecord {
  const { column, path, tdMdM, operator, rng } = ctx;
  const unit = operator.mudUnit;
  const out: DemoPressure[] = [];
  const schedule: MudRecord['schedule'] = [];
  const poreEmw = (tvdM: number) => emwAt(column, column.porePa, tvdM);
  const report = (mdM: number, entered: number, source: string, kind: 'mud_weight' | 'loss' = 'mud_weight') => {
    const tvdM = path.tvdAtMd(mdM);
    out.push(
      observation({
        kind,
        mdM,
        tvdM,
        tvdFromSurvey: ctx.tvdFromSurvey,
        valueEntered: entered,
        unitEntered: unit,
        observedOn: ctx.dateAt(mdM),
        source,
      }),
    );
    if (kind === 'mud_weight') schedule.push({ mdM, emwKgM3: mudEntryKgM3(entered, unit) });
  };
  /** First MD at or below `fromMdM` (2 m steps) where pore EMW exceeds `emwKgM3`, or NaN. */
  const flowsAt = (fromMdM: number, emwKgM3: number) => {
    for (let m = fromMdM; m <= tdMdM; m += 2) if (poreEmw(path.tvdAtMd(m)) > emwKgM3) return m;
    return NaN;
  };

  let entered = 0;
  let kickDone = plan.kickFromTvdM === undefined;
  let lossDone = plan.lossAtTvdM === undefined;
  let md = shoes[0].mdM + 10;
  for (;;) {
    const tvd = path.tvdAtMd(md);
    const stale = mudEntryKgM3(entered, unit);
    // Pore pressure first passes the mud at crossMd; the hole flows once it is 0.1 ppg underbalanced.
    const crossMd = kickDone || entered === 0 || tvd < plan.kickFromTvdM! ? NaN : flowsAt(md, stale);
    const kickMd = Number.isFinite(crossMd) ? flowsAt(crossMd, stale + ppg(0.1)) : NaN;
    if (!kickDone && tvd >= plan.kickFromTvdM!) kickDone = true;
    if (Number.isFinite(kickMd)) {
      // The mud was not raised: pore pressure passed it and the well flowed.
      const kickTvd = path.tvdAtMd(kickMd);
      for (let m = md; m < crossMd; m += DRILLING_RULES.reportEveryM) report(m, entered, 'daily drilling report');
      report(kickMd, entered, 'mud weight in use when the well flowed');
      const estimatePa = atTvd(column, column.porePa, kickTvd) + rng.normal(0, 0.03e6);
      out.push(
        observation({
          kind: 'kick',
          mdM: kickMd,
          tvdM: kickTvd,
          tvdFromSurvey: ctx.tvdFromSurvey,
          valueEntered: pressureEntry(estimatePa, operator.pressureUnit),
          unitEntered: operator.pressureUnit,
          quality: 'good',
          fluid: rng.chance(0.5) ? 'gas' : 'water',
          observedOn: ctx.dateAt(kickMd),
          source: 'influx while drilling; formation pressure from the shut-in drill-pipe pressure',
        }),
      );
      // Kill mud: the formation's EMW plus the trip margin and a little more.
      entered = mudEntry(poreEmw(kickTvd) + tripMarginKgM3 + ppg(0.2), unit, 'up');
      md = kickMd;
    } else {
      const nextTvd = path.tvdAtMd(Math.min(tdMdM, md + DRILLING_RULES.reportEveryM));
      entered = Math.max(entered, mudEntry(maxPoreEmw(column, tvd, nextTvd) + tripMarginKgM3, unit, 'up'));
      if (!lossDone && tvd >= plan.lossAtTvdM!) {
        lossDone = true;
        // Too heavy for the rock at the bit: losses, and the mud is cut back to the plan at the next report.
        const heavy = mudEntry(emwAt(column, column.fracturePa, tvd) + ppg(rng.uniform(0.1, 0.3)), unit, 'up');
        report(md, heavy, 'mud weight in use when losses began');
        report(md, heavy, 'partial mud losses; mud weight above the fracture gradient, cut back after', 'loss');
      } else {
        report(md, entered, 'daily drilling report');
      }
    }
    if (md >= tdMdM) break;
    md = Math.min(md + DRILLING_RULES.reportEveryM, tdMdM);
  }
  return { observations: out, schedule };
}
