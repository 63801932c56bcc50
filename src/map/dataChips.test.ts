import { describe, expect, it } from 'vitest';
import { dataChips } from './dataChips';

describe('dataChips', () => {
  const rich = { pressureCount: 12, logCount: 1, hasLot: true, hasSurvey: true, topCount: 4 };

  it('never colours a data chip as an error or a warning (a LOT is data, not a fault)', () => {
    for (const style of ['long', 'short'] as const) {
      for (const c of dataChips(rich, style)) expect(['info', 'default']).toContain(c.type);
      expect(dataChips(rich, style).find((c) => c.key === 'lot')).toEqual({ key: 'lot', label: 'LOT', type: 'info' });
    }
  });

  it('words the well card in full and the offset table briefly, skipping empty data in the table', () => {
    expect(dataChips(rich, 'long').map((c) => c.label)).toEqual(['12 pressures', '1 log curve', 'LOT', 'Survey', '4 tops']);
    expect(dataChips(rich, 'short').map((c) => c.label)).toEqual(['P 12', 'Logs 1', 'LOT', 'Svy']);
    const bare = { pressureCount: 0, logCount: 0, hasLot: false, hasSurvey: false };
    expect(dataChips(bare, 'short')).toEqual([]);
    expect(dataChips(bare, 'long')).toEqual([
      { key: 'pressures', label: '0 pressures', type: 'default' },
      { key: 'logs', label: '0 log curves', type: 'default' },
    ]);
  });
});
