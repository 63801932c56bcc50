import { interpolateRgb, rgb, scaleLinear } from 'd3';

/** A colour ramp: stops at positions 0…1, in increasing order. */
export type ColourRamp = readonly (readonly [position: number, colour: string])[];

/**
 * Depth of the top of overpressure, shallow → deep: pale sand to ink blue, so "darker is deeper" reads
 * without the legend, and shallow (the riskier end) stands out warm. Porelith's own stops.
 */
export const DEPTH_RAMP: ColourRamp = [
  [0, '#FCEBB0'],
  [0.25, '#F0A94B'],
  [0.5, '#3E9E96'],
  [0.75, '#2F6DB5'],
  [1, '#252A66'],
];

/** Standard deviation, small → large: near white to plum, a single hue so it is not mistaken for depth. */
export const STDDEV_RAMP: ColourRamp = [
  [0, '#F4F1F8'],
  [0.5, '#AE93CF'],
  [1, '#4A2475'],
];

/** Cross-validation residual (predicted − observed), negative → positive, with white at zero. */
export const RESIDUAL_RAMP: ColourRamp = [
  [0, '#2F6DB5'],
  [0.5, '#F7F7F5'],
  [1, '#C23B22'],
];

function checkRamp(ramp: ColourRamp): void {
  if (ramp.length < 2) throw new Error('A colour ramp needs at least 2 stops');
  for (let k = 1; k < ramp.length; k++) {
    if (!(ramp[k][0] > ramp[k - 1][0])) throw new Error('Colour ramp stops must be in increasing order');
  }
}

/**
 * A function from 0…1 to [r, g, b] (0–255) along the ramp, clamped at both ends; linear in RGB (d3-interpolate).
 * @example rampColour(DEPTH_RAMP)(0) // [252, 235, 176]
 */
export function rampColour(ramp: ColourRamp): (t: number) => [number, number, number] {
  checkRamp(ramp);
  const scale = scaleLinear<string>()
    .domain(ramp.map((s) => s[0]))
    .range(ramp.map((s) => s[1]))
    .interpolate(interpolateRgb)
    .clamp(true);
  return (t: number) => {
    const c = rgb(scale(Number.isFinite(t) ? t : 0));
    return [Math.round(c.r), Math.round(c.g), Math.round(c.b)];
  };
}

/**
 * A CSS `linear-gradient` showing the ramp, for the legend bar.
 * @example rampGradientCss(RESIDUAL_RAMP, 'to right') // 'linear-gradient(to right, #2F6DB5 0%, #F7F7F5 50%, #C23B22 100%)'
 */
export function rampGradientCss(ramp: ColourRamp, direction = 'to right'): string {
  checkRamp(ramp);
  return `linear-gradient(${direction}, ${ramp.map(([p, c]) => `${c} ${Math.round(p * 100)}%`).join(', ')})`;
}
