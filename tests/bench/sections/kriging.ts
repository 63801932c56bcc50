/**
 * Ordinary kriging of 500 wells onto a 250×250 grid with variance and 16 neighbours, against
 * @sakitam-gis/kriging on the same data and the same variogram (see ../reference/sakitamKriging.ts for how the
 * variogram is handed to it and what it computes).
 */
import {
  experimentalVariogram,
  fitVariogram,
  grid,
  ordinaryKriging,
  type Target,
  type Variogram,
} from '../../../shared/interpolation/index';
import { predictAll, semivariogramParameters, shiftedCovarianceParameters, trainWithParameters } from '../reference/sakitamKriging';
import { syntheticWells } from '../helpers/random';
import { timeMedian } from '../helpers/timing';
import type { BenchSection, Row } from '../helpers/types';
import kriging from '@sakitam-gis/kriging';

const WELLS = 500;
const SIZE_M = 25_000;
const CELL_M = 100;
const NEIGHBOURS = 16;
/** Every SUBSET_STEP-th cell for the all-points comparisons (all-points kriging is O(n²) per cell). */
const SUBSET_STEP = 25;

function maxAbsDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i] - b[i]));
  return m;
}

export const section: BenchSection = {
  name: 'kriging',
  async run(): Promise<Row[]> {
    const wells = syntheticWells(WELLS, SIZE_M, 7);
    const variogram: Variogram = fitVariogram(experimentalVariogram(wells, { lags: 15, lagWidth: 1000 }), { model: 'exponential' });
    const g = grid([0, 0, SIZE_M, SIZE_M], CELL_M);
    const targets = g.targets;
    const subset: Target[] = targets.filter((_, i) => i % SUBSET_STEP === 0);
    const t = wells.map((w) => w.value);
    const x = wells.map((w) => w.x);
    const y = wells.map((w) => w.y);

    const ours = timeMedian(() => ordinaryKriging(wells, variogram, targets, { maxNeighbours: NEIGHBOURS }), { repeat: 3 });
    const oursValues = Float64Array.from(ours.result, (r) => r.value);

    // the reference as it is meant to be used: its semivariogram Gram matrix over all wells, estimate only
    const ref = timeMedian(() => predictAll(trainWithParameters(t, x, y, semivariogramParameters(variogram)), targets), {
      repeat: 1,
      warmup: 0,
    });

    const allPoints = timeMedian(() => ordinaryKriging(wells, variogram, subset), { repeat: 1, warmup: 0 });
    const allValues = Float64Array.from(allPoints.result, (r) => r.value);
    const oursOnSubset = subset.map((_, i) => oursValues[i * SUBSET_STEP]);
    const refOnSubset = subset.map((_, i) => ref.result[i * SUBSET_STEP]);
    // the C + L form tends to OK with an O(1/L) error; one Richardson step on L and 2L removes it
    const shift = 1e4 * (variogram.nugget + variogram.sill);
    const shiftedL = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(variogram, shift)), subset);
    const shifted2L = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(variogram, 2 * shift)), subset);
    const shifted = shifted2L.map((v, i) => 2 * v - shiftedL[i]);

    // its variance costs O(n²) per cell: time a few hundred cells and scale up
    const fewCells = subset.slice(0, 250);
    const refModel = trainWithParameters(t, x, y, semivariogramParameters(variogram));
    const refVariance = timeMedian(() => fewCells.map((c) => kriging.variance(c.x, c.y, refModel as never)), { repeat: 1, warmup: 0 });
    const refVarianceGridMs = (refVariance.ms / fewCells.length) * targets.length;

    let minVariance = Infinity;
    for (const r of ours.result) minVariance = Math.min(minVariance, r.variance);
    const fitted = `exponential fit: nugget ${variogram.nugget.toFixed(0)}, sill ${variogram.sill.toFixed(0)}, range ${variogram.range.toFixed(0)} m`;
    const cells = `${g.nx}×${g.ny}`;
    return [
      {
        metric: `OK ${WELLS} wells → ${cells}, ${NEIGHBOURS} neighbours, with variance`,
        ours: ours.ms,
        reference: ref.ms,
        unit: 'ms',
        note: 'reference: all wells, estimate only; ' + fitted,
      },
      {
        metric: `  … reference estimate + its variance (scaled from ${fewCells.length} cells)`,
        ours: ours.ms,
        reference: ref.ms + refVarianceGridMs,
        unit: 'ms',
        note: 'like for like: both give value and variance',
      },
      {
        metric: 'max |Δestimate|: ours (16) vs reference',
        ours: maxAbsDiff(oursValues, ref.result),
        unit: 'value',
        note: 'reference predicts k₀ᵀΓ⁻¹t with no Σw = 1 constraint',
      },
      { metric: `ours all wells, ${subset.length} cells (every ${SUBSET_STEP}th)`, ours: allPoints.ms, unit: 'ms' },
      {
        metric: '  max |Δestimate|: ours all vs reference',
        ours: maxAbsDiff(allValues, refOnSubset),
        unit: 'value',
        note: 'same neighbourhood; left: formulation only',
      },
      {
        metric: '  max |Δestimate|: ours all vs reference, C+L form',
        ours: maxAbsDiff(allValues, shifted),
        unit: 'value',
        note: 'reference fed C(h)+L (L = 1e4, 2e4 × C(0), Richardson): tends to OK',
      },
      {
        metric: '  max |Δestimate|: ours 16 vs ours all',
        ours: maxAbsDiff(oursOnSubset, allValues),
        unit: 'value',
        note: 'effect of the neighbour limit',
      },
      { metric: '  min kriging variance on the grid', ours: minVariance, unit: 'value²', note: 'must be ≥ 0' },
    ];
  },
};
