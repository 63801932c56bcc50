export interface NumberFormat {
  decimalComma: boolean;
}

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_DECIMAL = /^[+-]?(\d{1,3}(\.\d{3})+|\d*),\d+([eE][+-]?\d+)?$/;
const COMMA_THOUSANDS = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/;

/**
 * A cell as a number: null when empty, NaN when it is text (the importer reports it, e.g.
 * "line 12, column md: 'abc' is not a number"). With `decimalComma`, "1234,5" and "1.234,5" are 1234.5
 * and a cell without a comma is read with a decimal point; without it, "1,234.5" is 1234.5.
 *
 * @example
 * parseNumber('1234,5', { decimalComma: true }); // → 1234.5
 * parseNumber(' 12.5 ', { decimalComma: false }); // → 12.5
 * parseNumber('', { decimalComma: false });       // → null
 * parseNumber('abc', { decimalComma: false });    // → NaN
 */
export function parseNumber(cell: string, format: NumberFormat): number | null {
  const t = cell.trim();
  if (t === '') return null;
  if (PLAIN.test(t)) return Number(t);
  if (format.decimalComma && COMMA_DECIMAL.test(t)) return Number(t.replace(/\./g, '').replace(',', '.'));
  if (!format.decimalComma && COMMA_THOUSANDS.test(t)) return Number(t.replace(/,/g, ''));
  return NaN;
}
