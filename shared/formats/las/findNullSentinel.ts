import type { ProblemList } from '../problem';

/** Null markers seen in log files (the standard names −9999, −999.25, −9999.25, §5.4; the rest: common practice, no source). */
const COMMON_NULL_MARKERS = [-999.25, -9999.25, -999, -9999, -99999, -999.99, -9999.99, 9999, 99999];
/** A run this long of one large negative value at the top or bottom of a curve is padding, not measurement. Common practice, no source. */
const MIN_EDGE_RUN = 3;
const LARGE = 999;

interface Suspect {
  count: number;
  columns: string[];
  firstLine: number;
}

/**
 * Checks for a value other than the declared NULL that recurs like a null marker. A known negative
 * marker (−999.25, −9999, …) seen at least twice is no measurement of any log curve, so the file's NULL
 * is wrong: that is an error at the NULL item, and those samples become NaN gaps so counts of valid
 * samples stay honest. Other suspects (a positive marker, or a large negative run at the start or end
 * of a curve) may be real readings and only warn. Returns the values turned into gaps.
 *
 * @example
 * checkNullSentinels([gr], ['GR'], lineOfRow, rowCount, -999.25, 8, errors, warnings);
 * // → Set {-9999}; error on line 8 "the file's NULL is -999.25 but its data uses -9999 for gaps …"
 */
export function checkNullSentinels(
  columns: Float64Array[],
  mnemonics: string[],
  lineOfRow: Int32Array,
  rowCount: number,
  nullValue: number,
  nullLine: number,
  errors: ProblemList,
  warnings: ProblemList,
): Set<number> {
  const markers = new Set(COMMON_NULL_MARKERS.filter((v) => v !== nullValue));
  const suspects = new Map<number, Suspect>();
  const note = (value: number, count: number, column: string, line: number) => {
    const s = suspects.get(value);
    if (!s) {
      suspects.set(value, { count, columns: [column], firstLine: line });
      return;
    }
    s.count += count;
    if (!s.columns.includes(column)) s.columns.push(column);
    s.firstLine = Math.min(s.firstLine, line);
  };

  columns.forEach((values, k) => {
    const counts = new Map<number, { count: number; firstLine: number }>();
    for (let i = 0; i < rowCount; i++) {
      const v = values[i];
      if ((v <= -LARGE || v >= LARGE) && markers.has(v)) {
        const c = counts.get(v);
        if (c) {
          c.count++;
          c.firstLine = Math.min(c.firstLine, lineOfRow[i]);
        } else counts.set(v, { count: 1, firstLine: lineOfRow[i] });
      }
    }
    for (const [v, c] of counts) if (c.count >= 2) note(v, c.count, mnemonics[k], c.firstLine);
    for (const run of edgeRuns(values, rowCount, markers)) {
      if (counts.has(run.value) || run.value === nullValue) continue;
      note(run.value, run.length, mnemonics[k], lineOfRow[run.start]);
    }
  });

  const gaps = new Set<number>();
  for (const [value, s] of suspects) {
    // A listed marker (an edge run is never one: every marker in a curve is counted above, and skipped there).
    if (markers.has(value) && value < 0) {
      gaps.add(value);
      errors.add(
        nullLine > 0 ? nullLine : s.firstLine,
        `the file's NULL is ${nullValue} but its data uses ${value} for gaps (${s.count} samples of ${s.columns.join(', ')}, first at line ${s.firstLine}); correct NULL in ~W`,
        'NULL',
      );
      continue;
    }
    warnings.add(
      s.firstLine,
      `value ${value} occurs ${s.count} times (${s.columns.join(', ')}) like a null marker, but NULL is ${nullValue}` +
        `${nullLine > 0 ? ` (line ${nullLine})` : ''}; check NULL in ~W`,
      s.columns[0],
    );
  }
  if (gaps.size) {
    for (const values of columns) for (let i = 0; i < rowCount; i++) if (gaps.has(values[i])) values[i] = NaN;
  }
  return gaps;
}

function edgeRuns(values: Float64Array, n: number, markers: Set<number>): { value: number; start: number; length: number }[] {
  const runs: { value: number; start: number; length: number }[] = [];
  if (n === 0) return runs;
  let head = 1;
  while (head < n && values[head] === values[0]) head++;
  if (head >= MIN_EDGE_RUN && looksLikeMarker(values[0], markers)) runs.push({ value: values[0], start: 0, length: head });
  if (head === n) return runs;
  let tail = 1;
  while (tail < n && values[n - 1 - tail] === values[n - 1]) tail++;
  if (tail >= MIN_EDGE_RUN && looksLikeMarker(values[n - 1], markers)) {
    if (values[n - 1] === values[0] && runs.length > 0) runs[0].length += tail;
    else runs.push({ value: values[n - 1], start: n - tail, length: tail });
  }
  return runs;
}

/** Densities in kg/m3 and depths are large and positive; padding values are large and negative, or a known marker. */
function looksLikeMarker(value: number, markers: Set<number>): boolean {
  return value <= -LARGE || markers.has(value);
}
