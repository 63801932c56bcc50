import type { Problem, ProblemList } from '../problem';
import type { DataColumns } from './readData';
import type { HeaderItem } from './types';

export interface IndexHeader {
  strt: number | null;
  stop: number | null;
  step: number | null;
  strtItem?: HeaderItem;
  stopItem?: HeaderItem;
  stepItem?: HeaderItem;
  nullValue: number;
}

export interface IndexCheckContext {
  mnemonic: string;
  errors: ProblemList;
  warnings: ProblemList;
  notes: Problem[];
}

/** Index values and STRT/STOP/STEP are compared to this relative precision, so that print rounding passes but a wrong step does not. */
function close(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)) + 1e-6 * scale;
}

/**
 * Checks the index (first column) for NULLs and a strict order, compares it with STRT/STOP/STEP, and
 * turns descending data (negative STEP, CWLS LAS 2.0 §5.4) into ascending order, every column alike.
 * Mutates `data` in place; returns whether the rows were reversed.
 *
 * @example
 * orderIndex(data, { strt: 1010, stop: 1000, step: -5, nullValue: -999.25 }, context); // → true
 */
export function orderIndex(data: DataColumns, header: IndexHeader, context: IndexCheckContext): boolean {
  const n = data.rowCount;
  const index = data.columns[0];
  const lines = data.lineOfRow;
  for (let i = 0; i < n; i++) {
    if (index[i] === header.nullValue) {
      context.errors.add(lines[i], `the index value is the NULL value ${header.nullValue}`, context.mnemonic);
      index[i] = NaN;
    }
  }

  let first = -1;
  let last = -1;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(index[i])) continue;
    if (first < 0) first = i;
    last = i;
  }
  if (first < 0) return false;

  const direction = mainDirection(index, first, last, header.step);
  let previous = first;
  let stepMismatchReported = false;
  for (let i = first + 1; i <= last; i++) {
    const value = index[i];
    if (Number.isNaN(value)) continue;
    const before = index[previous];
    if ((value - before) * direction <= 0) {
      context.errors.add(
        lines[i],
        `index ${value} is not ${direction > 0 ? 'greater' : 'less'} than ${before} on line ${lines[previous]}; ` +
          `the index must be strictly ${direction > 0 ? 'increasing' : 'decreasing'}`,
        context.mnemonic,
      );
    } else if (header.step !== null && header.step !== 0 && !stepMismatchReported && i === previous + 1 && !data.afterRefused[i]) {
      const stepHere = value - before;
      if (!close(stepHere, header.step, Math.abs(header.step))) {
        stepMismatchReported = true;
        context.warnings.add(
          lines[i],
          `STEP is ${header.step} but the index steps by ${roundForMessage(stepHere)} from line ${lines[previous]} to this line`,
        );
      }
    }
    previous = i;
  }

  const scale = header.step ? Math.abs(header.step) : 0;
  if (header.strt !== null && header.strtItem && !close(header.strt, index[first], scale)) {
    context.warnings.add(
      header.strtItem.line,
      `STRT is ${header.strt} but the first index value is ${index[first]} (line ${lines[first]})`,
    );
  }
  if (header.stop !== null && header.stopItem && !close(header.stop, index[last], scale)) {
    context.warnings.add(header.stopItem.line, `STOP is ${header.stop} but the last index value is ${index[last]} (line ${lines[last]})`);
  }

  if (direction > 0) return false;
  for (const column of data.columns) column.subarray(0, n).reverse();
  data.lineOfRow.subarray(0, n).reverse();
  context.notes.push({
    line: header.stepItem?.line ?? lines[n - 1],
    message: `the index decreases down the file${header.step !== null ? ` (STEP ${header.step})` : ''}; all curves were reordered to ascending ${context.mnemonic}`,
  });
  return true;
}

/**
 * The direction most steps take, so that one wild value (a typo at the end) breaks the order at one
 * line instead of turning every other line into an error. Ties go to the overall spread, then to STEP.
 */
function mainDirection(index: Float64Array, first: number, last: number, step: number | null): number {
  let up = 0;
  let down = 0;
  let previous = index[first];
  for (let i = first + 1; i <= last; i++) {
    const value = index[i];
    if (Number.isNaN(value)) continue;
    if (value > previous) up++;
    else if (value < previous) down++;
    previous = value;
  }
  if (up !== down) return up > down ? 1 : -1;
  const spread = index[last] - index[first];
  if (spread !== 0) return Math.sign(spread);
  return step !== null && step < 0 ? -1 : 1;
}

/** Differences of printed decimals carry float noise (0.30000000000000004); 12 significant digits hide it. */
function roundForMessage(x: number): number {
  return Number(x.toPrecision(12));
}
