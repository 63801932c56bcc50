import { describe, expect, it } from 'vitest';
import type { PressureObservation } from '@shared/schemas/wells';
import { observationMarks, spreadLabels } from './observations';

const obs = (kind: PressureObservation['kind'], quality: PressureObservation['quality'], id: string): PressureObservation => ({
  id,
  kind,
  quality,
  mdM: 1000,
  tvdM: 1000,
  valueEntered: 1,
  unitEntered: 'MPa',
  valueSi: 1e6,
  emwKgM3: 102,
  fluid: null,
  observedOn: null,
  source: null,
});

describe('observation marks', () => {
  it('leaves mud weights to the step line and draws good tests last', () => {
    const marks = observationMarks([
      obs('formation_test', 'good', 'a'),
      obs('mud_weight', 'unknown', 'b'),
      obs('lot', 'good', 'c'),
      obs('formation_test', 'tight', 'd'),
    ]);
    expect(marks.map((m) => m.id)).toEqual(['c', 'd', 'a']);
    expect(marks[1].group).toBe('Formation test (tight, supercharged or doubtful)');
  });
  it('drops labels that would overprint', () => {
    expect(spreadLabels([{ y: 100 }, { y: 105 }, { y: 130 }], 12).map((l) => l.y)).toEqual([100, 130]);
  });
});
