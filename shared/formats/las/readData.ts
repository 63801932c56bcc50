import type { ProblemList } from '../problem';
import { MAX_LINE_LENGTH, firstNonBlank } from './lasLines';
import { scanNumbers } from './scanNumbers';

/** The ~A section as columns in file order, with the 1-based line where each row starts. */
export interface DataColumns {
  columns: Float64Array[];
  lineOfRow: Int32Array;
  /** 1 where a refused data line lies between this row and the one before it in the file: the spacing there proves nothing. Not reordered. */
  afterRefused: Uint8Array;
  rowCount: number;
}

export interface DataReadOptions {
  mnemonics: string[];
  wrap: boolean;
  nullValue: number;
  errors: ProblemList;
  warnings: ProblemList;
}

/** WRAP YES lines should fit 80 characters including CR LF (CWLS LAS 2.0, §5.3). */
const MAX_WRAPPED_LINE_LENGTH = 80;
const MAX_QUOTED_TOKEN = 40;

function quote(token: string): string {
  return token.length > MAX_QUOTED_TOKEN ? `'${token.slice(0, MAX_QUOTED_TOKEN)}…'` : `'${token}'`;
}

/**
 * Reads `lines[start..end)` of the ~A section, one depth per line (WRAP NO) or the index alone on a line
 * followed by the other values over several lines (WRAP YES). Rows with the wrong number of values are
 * reported and left out; text in a number is reported and kept as NaN; NULL values become NaN.
 *
 * @example
 * readData(['1 2', '2 -999.25'], 0, 2, { mnemonics: ['DEPT', 'GR'], wrap: false, nullValue: -999.25, errors, warnings })
 *   .columns[1]; // → Float64Array [2, NaN]
 */
export function readData(lines: string[], start: number, end: number, options: DataReadOptions): DataColumns {
  const width = options.mnemonics.length;
  const capacity = Math.max(0, end - start);
  const row = new Float64Array(width);
  const columns = options.mnemonics.map(() => new Float64Array(capacity));
  const lineOfRow = new Int32Array(capacity);
  const afterRefused = new Uint8Array(capacity);
  let rowCount = 0;
  let refused = false;

  let lineNumber = 0;
  const textTokens: { token: string; position: number }[] = [];
  const onText = (token: string, position: number) => textTokens.push({ token, position });
  const reportText = (offset: number) => {
    for (const t of textTokens) {
      options.errors.add(lineNumber, `${quote(t.token)} is not a number`, options.mnemonics[offset + t.position]);
    }
    textTokens.length = 0;
  };
  const keepRow = (line: number) => {
    for (let k = 0; k < width; k++) {
      const v = row[k];
      // The index keeps its NULLs so that orderIndex can tell them from text.
      columns[k][rowCount] = k > 0 && v === options.nullValue ? NaN : v;
    }
    lineOfRow[rowCount] = line;
    afterRefused[rowCount] = refused ? 1 : 0;
    refused = false;
    rowCount++;
  };

  // WRAP YES state: values gathered so far for the current index, and where that index stood.
  let filled = -1;
  let recordLine = 0;
  let longLineWarned = false;

  for (let i = start; i < end; i++) {
    const s = lines[i];
    if (s.length > MAX_LINE_LENGTH) {
      refused = true; // reported by findSections
      continue;
    }
    const at = firstNonBlank(s);
    if (at < 0 || s.charCodeAt(at) === 35 /* # */) continue;
    lineNumber = i + 1;

    if (!options.wrap) {
      const count = scanNumbers(s, row, 0, width, onText);
      if (count !== width) {
        textTokens.length = 0;
        options.errors.add(lineNumber, `expected ${width} values, found ${count}`);
        refused = true;
        continue;
      }
      reportText(0);
      keepRow(lineNumber);
      continue;
    }

    if (s.length > MAX_WRAPPED_LINE_LENGTH && !longLineWarned) {
      longLineWarned = true;
      options.warnings.add(lineNumber, `line is ${s.length} characters long; WRAP YES lines should be at most ${MAX_WRAPPED_LINE_LENGTH}`);
    }
    if (filled < 0) {
      const count = scanNumbers(s, row, 0, 1, onText);
      if (count !== 1) {
        textTokens.length = 0;
        options.errors.add(lineNumber, `expected the index value alone on this line (WRAP YES), found ${count} values`);
        refused = true;
        continue;
      }
      reportText(0);
      recordLine = lineNumber;
      filled = 0;
    } else {
      const room = width - 1 - filled;
      const count = scanNumbers(s, row, 1 + filled, room, onText);
      if (count > room) {
        textTokens.length = 0;
        options.errors.add(
          lineNumber,
          `expected ${width - 1} values after the index ${row[0]} (line ${recordLine}), found ${filled + count}`,
        );
        filled = -1;
        refused = true;
        continue;
      }
      reportText(1 + filled);
      filled += count;
    }
    if (filled === width - 1) {
      keepRow(recordLine);
      filled = -1;
    }
  }
  if (options.wrap && filled >= 0) {
    options.errors.add(recordLine, `expected ${width - 1} values after the index ${row[0]}, found ${filled} before the data ends`);
  }
  return { columns, lineOfRow, afterRefused, rowCount };
}
