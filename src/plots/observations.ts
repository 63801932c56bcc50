import type { PressureKind, PressureObservation } from '@shared/schemas/wells';
import { markGroup, markStyle, type MarkStyle } from './styles';

/** An observation ready to draw: its mark, legend group and the values the plot needs. */
export interface ObservationMark {
  id: string;
  kind: Exclude<PressureKind, 'mud_weight'>;
  tvdM: number;
  mdM: number;
  pressurePa: number;
  style: MarkStyle;
  group: string;
  quality: PressureObservation['quality'];
  source: string | null;
}

/** Drawing order: events under tests, so good tests stay on top and readable. */
const ORDER: Record<Exclude<PressureKind, 'mud_weight'>, number> = {
  other: 0,
  pp_estimate: 1,
  loss: 2,
  kick: 3,
  fit: 4,
  lot: 5,
  dst: 6,
  formation_test: 7,
};

/**
 * The point observations of a well (everything but mud weights, which are drawn as a line), with their marks,
 * sorted in drawing order with good tests last.
 * @example observationMarks(pressures).map((m) => m.group); // ['Leak-off test', 'Formation test (good)', …]
 */
export function observationMarks(observations: readonly PressureObservation[]): ObservationMark[] {
  return observations
    .filter((o): o is PressureObservation & { kind: Exclude<PressureKind, 'mud_weight'> } => o.kind !== 'mud_weight')
    .map((o) => ({
      id: o.id,
      kind: o.kind,
      tvdM: o.tvdM,
      mdM: o.mdM,
      pressurePa: o.valueSi,
      style: markStyle(o.kind, o.quality),
      group: markGroup(o.kind, o.quality),
      quality: o.quality,
      source: o.source,
    }))
    .sort((a, b) => ORDER[a.kind] - ORDER[b.kind] + (a.style.hollow === b.style.hollow ? 0 : a.style.hollow ? -0.5 : 0.5));
}

/**
 * Labels down a depth axis, dropping any that would sit closer than `minGapPx` to the one kept above it,
 * so formation-top names never overprint each other.
 * @example spreadLabels([{ y: 100 }, { y: 105 }, { y: 130 }], 12).length; // 2
 */
export function spreadLabels<T extends { y: number }>(labels: readonly T[], minGapPx: number): T[] {
  const out: T[] = [];
  for (const l of [...labels].sort((a, b) => a.y - b.y)) {
    if (out.length === 0 || l.y - out[out.length - 1].y >= minGapPx) out.push(l);
  }
  return out;
}
