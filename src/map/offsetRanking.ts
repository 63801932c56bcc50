import { OFFSET_SCORE_WEIGHTS } from '@shared/schemas/planning';

type Weights = Record<keyof typeof OFFSET_SCORE_WEIGHTS, number>;

/** The words for each part of the score, in the order of their weight in OFFSET_SCORE_WEIGHTS. */
const PART_WORDS: Record<keyof Weights, string> = {
  near: 'nearness',
  water: 'similar water depth',
  depth: 'depth reached',
  data: 'pressure data, LOT and logs',
};

/**
 * How the offset list is ordered, written from the server's weights so the words cannot drift from the ranking.
 * @example offsetRankingNote() // 'Ranked by score (0–1): nearness 40 %, similar water depth 20 %, depth reached 20 %, pressure data, LOT and logs 20 %.'
 */
export function offsetRankingNote(weights: Weights = OFFSET_SCORE_WEIGHTS): string {
  const total = Object.values(weights).reduce((a, b) => a + b, 0);
  if (!(total > 0)) throw new Error(`offsetRankingNote: weights must add up to more than 0, got ${total}.`);
  const parts = (Object.keys(PART_WORDS) as (keyof Weights)[])
    .filter((k) => weights[k] > 0)
    .sort((a, b) => weights[b] - weights[a])
    .map((k) => `${PART_WORDS[k]} ${Math.round((weights[k] / total) * 100)} %`);
  return `Ranked by score (0–1): ${parts.join(', ')}.`;
}

/**
 * A candidate's score with two decimals.
 * @example formatScore(0.8164) // '0.82'
 */
export function formatScore(score: number): string {
  if (!Number.isFinite(score)) throw new Error(`formatScore: score must be a finite number, got ${score}.`);
  return score.toFixed(2);
}
