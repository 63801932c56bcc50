import type { CsvDelimiter } from './types';

/** Tab first: it never appears inside numbers; semicolon before comma: a ';' file may use decimal commas. */
const CANDIDATES: CsvDelimiter[] = ['\t', ';', '|', ','];
const SAMPLE_RECORDS = 50;
const SAMPLE_CHARS = 65_536;

/**
 * Picks the delimiter whose count per record (outside quotes) is the most consistent over the first
 * records; ties go to tab, then semicolon, pipe, comma. Comma when nothing splits the lines.
 *
 * @example
 * detectDelimiter('md;pp\n1000,5;12,3\n'); // → ';'
 */
export function detectDelimiter(text: string): CsvDelimiter {
  const perRecord: number[][] = [];
  let counts = [0, 0, 0, 0];
  let blank = true;
  let inQuotes = false;
  const end = Math.min(text.length, SAMPLE_CHARS);
  for (let i = 0; i < end && perRecord.length < SAMPLE_RECORDS; i++) {
    const ch = text[i];
    if (ch === '"') inQuotes = !inQuotes;
    if (inQuotes) continue;
    if (ch === '\n') {
      if (!blank) perRecord.push(counts);
      counts = [0, 0, 0, 0];
      blank = true;
      continue;
    }
    const k = CANDIDATES.indexOf(ch as CsvDelimiter);
    if (k >= 0) counts[k]++;
    if (ch !== '\r' && ch !== ' ') blank = false;
  }
  if (!blank) perRecord.push(counts);

  let best: CsvDelimiter = ',';
  let bestScore = 0;
  CANDIDATES.forEach((candidate, k) => {
    const score = consistency(perRecord.map((c) => c[k]));
    if (score > bestScore) {
      best = candidate;
      bestScore = score;
    }
  });
  return best;
}

/** Share of records holding the most common non-zero count; 0 when the most common count is zero. */
function consistency(counts: number[]): number {
  if (counts.length === 0) return 0;
  const frequency = new Map<number, number>();
  for (const c of counts) frequency.set(c, (frequency.get(c) ?? 0) + 1);
  let mode = 0;
  let modeFrequency = 0;
  for (const [count, f] of frequency) {
    if (f > modeFrequency || (f === modeFrequency && count > mode)) {
      mode = count;
      modeFrequency = f;
    }
  }
  return mode === 0 ? 0 : modeFrequency / counts.length;
}
