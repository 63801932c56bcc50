import { symbolCircle, symbolCross, symbolDiamond, symbolSquare, symbolTriangle, symbolWye, type SymbolType } from 'd3';
import type { PressureKind, PressureQuality } from '@shared/schemas/wells';

/**
 * Porelith's plot colours. Literal colours, not CSS variables, so an exported SVG or PNG looks the same
 * outside the page. Chosen to stay apart for common colour-vision deficiencies (blue / brick / amber / teal).
 */
export const CURVE_COLOURS = {
  hydrostatic: '#2F6DB5',
  overburden: '#3D3229',
  pore: '#C23B22',
  fracture: '#D08A00',
  trend: '#0E7173',
  mud: '#7B55A8',
  top: '#B0306A',
  grid: '#E3E8EB',
  axis: '#4A5A63',
  ink: '#1B262C',
  muted: '#6B7A82',
  selection: 'rgba(14, 113, 115, 0.14)',
  tracks: { sonic: '#1F5F8B', resistivity: '#8A3B12', density: '#4C6B2F', gamma: '#5A5A5A' },
} as const;

export interface MarkStyle {
  label: string;
  symbol: SymbolType;
  colour: string;
  /** Hollow marks are the less trusted readings. */
  hollow: boolean;
}

const KIND_MARKS: Record<Exclude<PressureKind, 'mud_weight'>, { label: string; symbol: SymbolType; colour: string }> = {
  formation_test: { label: 'Formation test', symbol: symbolCircle, colour: '#0B5C5E' },
  dst: { label: 'Drill-stem test', symbol: symbolSquare, colour: '#1E4E9A' },
  kick: { label: 'Kick', symbol: symbolTriangle, colour: '#C23B22' },
  loss: { label: 'Loss', symbol: symbolWye, colour: '#7B55A8' },
  lot: { label: 'Leak-off test', symbol: symbolDiamond, colour: '#9A6400' },
  fit: { label: 'Formation integrity test', symbol: symbolDiamond, colour: '#9A6400' },
  pp_estimate: { label: 'Earlier pore estimate', symbol: symbolCross, colour: '#5F6E76' },
  other: { label: 'Other', symbol: symbolCross, colour: '#8A969C' },
};

/**
 * How one observation is marked: symbol and colour by kind, filled for good quality (and always for
 * events such as kicks and losses, which have no test quality), hollow for tight, supercharged or doubtful
 * tests and for FITs (a lower bound, not a leak-off).
 * @example markStyle('formation_test', 'tight').hollow; // true
 */
export function markStyle(kind: Exclude<PressureKind, 'mud_weight'>, quality: PressureQuality): MarkStyle {
  const k = KIND_MARKS[kind];
  const tested = kind === 'formation_test' || kind === 'dst';
  const hollow = kind === 'fit' || (tested && quality !== 'good');
  return { ...k, hollow };
}

/** Legend key of an observation group: kind, and for tests whether the reading is good. */
export function markGroup(kind: Exclude<PressureKind, 'mud_weight'>, quality: PressureQuality): string {
  const s = markStyle(kind, quality);
  if (kind === 'formation_test' || kind === 'dst') return `${s.label}${s.hollow ? ' (tight, supercharged or doubtful)' : ' (good)'}`;
  return s.label;
}

/** Colours for wells side by side on the comparison plot (our own set, distinct in hue and lightness). */
export const WELL_COLOURS = ['#0E7173', '#C23B22', '#2F6DB5', '#D08A00', '#7B55A8', '#4C6B2F', '#B0306A', '#3D3229'] as const;

/**
 * The colour of the i-th well (repeats after eight).
 * @example wellColour(9); // '#C23B22'
 */
export function wellColour(index: number): string {
  return WELL_COLOURS[((index % WELL_COLOURS.length) + WELL_COLOURS.length) % WELL_COLOURS.length];
}
