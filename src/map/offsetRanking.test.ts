import { describe, expect, it } from 'vitest';
import { OFFSET_SCORE_WEIGHTS } from '@shared/schemas/planning';
import { formatScore, offsetRankingNote } from './offsetRanking';

describe('offsetRankingNote', () => {
  it("states the server's weights, heaviest first, as shares that add up to 100 %", () => {
    // The weights are common practice, no source; what is checked is that the note says what the server does.
    expect(Object.values(OFFSET_SCORE_WEIGHTS).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(offsetRankingNote()).toBe(
      'Ranked by score (0–1): nearness 40 %, similar water depth 20 %, depth reached 20 %, pressure data, LOT and logs 20 %.',
    );
  });

  it('follows other weights (reordered, normalised, zero parts left out)', () => {
    expect(offsetRankingNote({ near: 1, water: 0, depth: 2, data: 1 })).toBe(
      'Ranked by score (0–1): depth reached 50 %, nearness 25 %, pressure data, LOT and logs 25 %.',
    );
    expect(() => offsetRankingNote({ near: 0, water: 0, depth: 0, data: 0 })).toThrow(
      'offsetRankingNote: weights must add up to more than 0, got 0.',
    );
  });

  it('shows a score with two decimals', () => {
    expect(formatScore(0.8164)).toBe('0.82');
    expect(formatScore(1)).toBe('1.00');
    expect(() => formatScore(Number.NaN)).toThrow('formatScore: score must be a finite number, got NaN.');
  });
});
