import type { CsvDelimiter, CsvRow } from './types';

const SAMPLE_ROWS = 200;
const COMMA_NUMBER = /^\s*[+-]?(\d{1,3}(\.\d{3})+|\d+),\d+\s*$/;
const POINT_NUMBER = /^\s*[+-]?\d*\.\d+\s*$/;

/**
 * Decimal commas are possible only when the delimiter is not a comma; they are assumed when numbers
 * written like 1234,5 outnumber numbers written like 1234.5 in the first rows.
 *
 * @example
 * detectDecimalComma([{ line: 2, cells: ['1000,5', '12,3'] }], ';'); // → true
 */
export function detectDecimalComma(rows: CsvRow[], delimiter: CsvDelimiter): boolean {
  if (delimiter === ',') return false;
  let comma = 0;
  let point = 0;
  const n = Math.min(rows.length, SAMPLE_ROWS);
  for (let r = 0; r < n; r++) {
    for (const cell of rows[r].cells) {
      if (COMMA_NUMBER.test(cell)) comma++;
      else if (POINT_NUMBER.test(cell)) point++;
    }
  }
  return comma > 0 && comma >= point;
}
