import { line, symbol, type ScaleContinuousNumeric, type SymbolType } from 'd3';
import { G } from '@shared/units';
import type { PressureObservation } from '@shared/schemas/wells';

export type Point = [x: number, y: number];

/**
 * Points of a curve against depth, NaN left in so the path breaks at gaps.
 * @example curvePoints(Float64Array.of(1, 2), Float64Array.of(10, NaN)); // [[10, 1], [NaN, 2]]
 */
export function curvePoints(depth: ArrayLike<number>, values: ArrayLike<number>): Point[] {
  if (depth.length !== values.length) throw new Error(`curvePoints: ${depth.length} depths but ${values.length} values`);
  return Array.from({ length: depth.length }, (_, i) => [values[i], depth[i]] as Point);
}

/**
 * Keeps, per band of `bandHeight` depth units, the sample with the smallest and the largest x (in depth order),
 * so a 5,000-sample log drawn 600 px tall keeps every spike yet stays a light path. Gaps survive as NaN points.
 * @example thinByDepth(points, 0.5); // at most ~2 points per half display-unit of depth
 */
export function thinByDepth(points: Point[], bandHeight: number): Point[] {
  if (!(bandHeight > 0) || points.length < 4) return points;
  const out: Point[] = [];
  let band = NaN;
  let lo: Point | null = null;
  let hi: Point | null = null;
  const flush = () => {
    if (lo && hi) {
      if (lo === hi) out.push(lo);
      else out.push(...(lo[1] <= hi[1] ? [lo, hi] : [hi, lo]));
    }
    lo = hi = null;
  };
  for (const p of points) {
    if (Number.isNaN(p[0]) || Number.isNaN(p[1])) {
      flush();
      if (out.length && !Number.isNaN(out[out.length - 1][0])) out.push(p);
      band = NaN;
      continue;
    }
    const b = Math.floor(p[1] / bandHeight);
    if (b !== band) {
      flush();
      band = b;
    }
    if (!lo || p[0] < lo[0]) lo = p;
    if (!hi || p[0] > hi[0]) hi = p;
  }
  flush();
  return out;
}

/**
 * An SVG path through points (broken at NaN) on the given scales.
 * @example pathOf([[1, 100], [2, 200]], x, y); // 'M…L…'
 */
export function pathOf(points: Point[], x: ScaleContinuousNumeric<number, number>, y: ScaleContinuousNumeric<number, number>): string {
  const ok = (v: number) => Number.isFinite(v);
  return (
    line<Point>()
      .defined((p) => ok(p[0]) && ok(p[1]) && ok(x(p[0])) && ok(y(p[1])))
      .x((p) => x(p[0]))
      .y((p) => y(p[1]))(points) ?? ''
  );
}

/** One vertex of the mud-weight line: a density in use from this depth on. */
export interface MudVertex {
  tvdM: number;
  mdM: number;
  kgM3: number;
}

/**
 * The mud weight in use as a step line: each report holds from its depth down to the next report (the last one
 * to `baseTvdM`), so the line has two vertices per report. Pressure of a vertex is kgM3·g·TVD.
 * @example mudWeightSteps([{ kind: 'mud_weight', tvdM: 1000, mdM: 1000, valueSi: 1100 * 9.80665 * 1000 } …], 3000);
 */
export function mudWeightSteps(
  observations: readonly Pick<PressureObservation, 'kind' | 'tvdM' | 'mdM' | 'valueSi'>[],
  baseTvdM: number,
): MudVertex[] {
  const mud = observations.filter((o) => o.kind === 'mud_weight' && o.tvdM > 0).sort((a, b) => a.tvdM - b.tvdM);
  const out: MudVertex[] = [];
  mud.forEach((o, i) => {
    const kgM3 = o.valueSi / (G * o.tvdM);
    const next = mud[i + 1];
    const endTvd = next ? next.tvdM : Math.max(baseTvdM, o.tvdM);
    const endMd = next ? next.mdM : o.mdM + (endTvd - o.tvdM);
    out.push({ tvdM: o.tvdM, mdM: o.mdM, kgM3 }, { tvdM: endTvd, mdM: endMd, kgM3 });
  });
  return out;
}

/**
 * The SVG path of a d3 symbol of `size` square pixels.
 * @example symbolPath(symbolCircle, 48);
 */
export function symbolPath(type: SymbolType, size: number): string {
  return symbol(type, size)() ?? '';
}
