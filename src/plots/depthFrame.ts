import { convert } from '@shared/units';
import { interpolateAt, type WellDatums } from '@shared/profile';
import type { DisplayDepthUnit } from '@/stores/units';

/** Depth down the plot: true vertical or measured along the bore. */
export type DepthMode = 'tvd' | 'md';
/** What vertical depths are measured from: rotary table (rig datum), sea level, mudline. */
export type DepthDatum = 'rt' | 'sl' | 'ml';

export interface DepthFrame {
  mode: DepthMode;
  datum: DepthDatum;
  unit: DisplayDepthUnit;
}

export const DATUM_LABELS: Record<DepthDatum, string> = { rt: 'rotary table', sl: 'sea level', ml: 'mudline' };

/**
 * Metres to take off a TVD below the rig datum to measure it from `datum`.
 * TVDSS = TVD − RT elevation; below mudline = TVDSS − water depth (= TVD − air gap − water depth offshore).
 * @example datumShiftM('ml', { seaLevelTvdM: 25, mudlineTvdM: 125 }); // 125
 */
export function datumShiftM(datum: DepthDatum, datums: WellDatums): number {
  return datum === 'rt' ? 0 : datum === 'sl' ? datums.seaLevelTvdM : datums.mudlineTvdM;
}

/**
 * A sample's depth as the plot shows it, in the frame's unit. MD is always from the rig datum (the datum choice
 * applies to vertical depth only).
 * @example displayDepth(1000, 1010, { mode: 'tvd', datum: 'sl', unit: 'm' }, { seaLevelTvdM: 25, mudlineTvdM: 125 }); // 975
 */
export function displayDepth(tvdM: number, mdM: number, frame: DepthFrame, datums: WellDatums): number {
  const metres = frame.mode === 'md' ? mdM : tvdM - datumShiftM(frame.datum, datums);
  return frame.unit === 'm' ? metres : convert(metres, 'm', frame.unit);
}

/**
 * Many depths at once (a Float64Array for plotting).
 * @example displayDepths(profile.tvdM, profile.mdM, frame, datums);
 */
export function displayDepths(tvdM: ArrayLike<number>, mdM: ArrayLike<number>, frame: DepthFrame, datums: WellDatums): Float64Array {
  return Float64Array.from({ length: tvdM.length }, (_, i) => displayDepth(tvdM[i], mdM[i], frame, datums));
}

/**
 * A displayed vertical depth back to TVD below the rig datum, m (TVD frames only; MD needs the survey).
 * @example tvdFromDisplay(3198.8, { mode: 'tvd', datum: 'sl', unit: 'ft' }, datums); // ≈ 1000
 */
export function tvdFromDisplay(value: number, frame: DepthFrame, datums: WellDatums): number {
  const metres = frame.unit === 'm' ? value : convert(value, frame.unit, 'm');
  return metres + datumShiftM(frame.datum, datums);
}

/**
 * The depth axis title with its unit.
 * @example depthAxisLabel({ mode: 'tvd', datum: 'sl', unit: 'm' }); // 'TVD below sea level (m)'
 */
export function depthAxisLabel(frame: DepthFrame): string {
  if (frame.mode === 'md') return `MD from rotary table (${frame.unit})`;
  return `TVD below ${DATUM_LABELS[frame.datum]} (${frame.unit})`;
}

/**
 * A TVD (below the rig datum, m) as the plot shows it: in MD frames its MD along the profile's own grid (the
 * survey), else the TVD from the frame's datum; in the frame's unit.
 * @example depthOfTvd(2000, { tvdM: [0, 2000], mdM: [0, 2100] }, { mode: 'md', datum: 'rt', unit: 'm' }, datums); // 2100
 */
export function depthOfTvd(
  tvdM: number,
  grid: { tvdM: ArrayLike<number>; mdM: ArrayLike<number> },
  frame: DepthFrame,
  datums: WellDatums,
): number {
  const mdM = frame.mode === 'md' ? interpolateAt(grid.tvdM, grid.mdM, tvdM) : tvdM;
  return displayDepth(tvdM, mdM, frame, datums);
}

/**
 * A displayed depth as text with its unit, marked "MD" in MD frames so it is never read as vertical depth.
 * @example depthText(2046.4, { mode: 'md', datum: 'rt', unit: 'm' }); // '2,046 m MD'
 */
export function depthText(value: number, frame: DepthFrame): string {
  if (!Number.isFinite(value)) return '—';
  return `${value.toLocaleString('en', { maximumFractionDigits: 0 })} ${frame.unit}${frame.mode === 'md' ? ' MD' : ''}`;
}
