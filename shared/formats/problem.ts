/**
 * A problem found while reading a file, pinned to the 1-based physical line where it starts
 * so that a person can open the file in any editor and find it.
 */
export interface Problem {
  line: number;
  /** Column name (CSV header or LAS curve mnemonic) when the problem belongs to one cell. */
  column?: string;
  message: string;
}

/**
 * The one-line form shown to users and written in server logs.
 *
 * @example
 * formatProblem({ line: 12, column: 'md', message: "'abc' is not a number" });
 * // → "line 12, column md: 'abc' is not a number"
 */
export function formatProblem(problem: Problem): string {
  const where = problem.column === undefined ? `line ${problem.line}` : `line ${problem.line}, column ${problem.column}`;
  return `${where}: ${problem.message}`;
}

/** How many problems of one list are kept before the rest are only counted (a broken 100,000-line file must not yield 100,000 objects). */
export const MAX_LISTED_PROBLEMS = 200;

/**
 * Collects problems up to {@link MAX_LISTED_PROBLEMS}; `finish()` sorts them by line and appends one summary line for the rest.
 *
 * @example
 * const errors = new ProblemList();
 * errors.add(57, 'expected 6 values, found 5');
 * errors.finish(); // → [{ line: 57, message: 'expected 6 values, found 5' }]
 */
export class ProblemList {
  private readonly listed: Problem[] = [];
  private unlisted = 0;
  private firstUnlistedLine = 0;

  constructor(private readonly limit = MAX_LISTED_PROBLEMS) {}

  add(line: number, message: string, column?: string): void {
    if (this.listed.length < this.limit) {
      this.listed.push(column === undefined ? { line, message } : { line, column, message });
      return;
    }
    if (this.unlisted === 0) this.firstUnlistedLine = line;
    this.unlisted += 1;
  }

  get count(): number {
    return this.listed.length + this.unlisted;
  }

  /** The listed problems in line order (stable), then the summary of the rest. */
  finish(): Problem[] {
    const sorted = [...this.listed].sort((a, b) => a.line - b.line);
    if (this.unlisted === 0) return sorted;
    return [...sorted, { line: this.firstUnlistedLine, message: `${this.unlisted} more problems from this line on are not listed` }];
  }
}
