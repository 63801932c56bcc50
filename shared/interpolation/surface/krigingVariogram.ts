import { experimentalVariogram } from '../experimentalVariogram';
import { fitVariogramDetailed } from '../fitVariogram';
import type { DataPoint, Variogram, VariogramLag } from '../types';
import { SurfaceInputError } from './types';

const EXPERIMENTAL_LAGS = 12;

export interface KrigingVariogram {
  /** In the solved (scaled) unit squared. */
  variogram: Variogram;
  experimental: VariogramLag[];
  fitted: boolean;
  /** What the fit says about itself (a range on a bound). */
  warnings: string[];
}

/**
 * The experimental variogram of the kriged values and the model kriging uses: the one given (its nugget and sill
 * in the quantity's SI unit squared, scaled here to the solved unit) or, without one, the model fitted to it.
 * @example krigingVariogram(data, data, { model: 'spherical', variogram: null }, 1).fitted // true
 */
export function krigingVariogram(
  krigData: readonly DataPoint[],
  locations: readonly DataPoint[],
  method: { model: Variogram['model']; variogram: Variogram | null },
  scale: number,
): KrigingVariogram {
  let maxD = 0;
  for (let i = 0; i < locations.length; i++)
    for (let j = i + 1; j < locations.length; j++)
      maxD = Math.max(maxD, Math.hypot(locations[i].x - locations[j].x, locations[i].y - locations[j].y));
  // Lags up to half the largest well separation: past it few pairs span the area and the estimates are erratic
  // (common practice, no source). fitVariogram bounds the practical range by the largest lag it is given.
  const experimental = experimentalVariogram(krigData, { lags: EXPERIMENTAL_LAGS, lagWidth: maxD / 2 / EXPERIMENTAL_LAGS });
  if (method.variogram) {
    const v = method.variogram;
    return { variogram: { ...v, nugget: v.nugget / scale ** 2, sill: v.sill / scale ** 2 }, experimental, fitted: false, warnings: [] };
  }
  if (experimental.length < 3)
    throw new SurfaceInputError('Too few well pairs to fit a variogram: give one by hand, or use inverse-distance weighting.');
  const fit = fitVariogramDetailed(experimental, { model: method.model });
  const km = Number((fit.variogram.range / 1000).toPrecision(3));
  const warnings =
    fit.rangeAtBound === 'upper'
      ? [
          `The fitted range reached the largest lag (${km} km): the semivariance still rises there, the mark of a regional trend${detrendedNote(krigData, locations)}. Far from wells σ may be too small.`,
        ]
      : fit.rangeAtBound === 'lower'
        ? [
            `The fitted range fell to the shortest lag (${km} km): in effect no correlation at this well spacing, so the surface is close to the wells' mean away from each well.`,
          ]
        : [];
  return { variogram: fit.variogram, experimental, fitted: true, warnings };
}

/** A hint to remove a planar trend, unless the values kriged are already residuals. */
function detrendedNote(krigData: readonly DataPoint[], locations: readonly DataPoint[]): string {
  return krigData === locations ? '; removing a planar trend may help' : ' even after the plane was removed';
}
