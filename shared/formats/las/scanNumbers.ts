/** Exact powers of ten as doubles (10^22 is the largest exactly representable one). */
const POW10 = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const MAX_EXACT_MANTISSA = 2 ** 53;

/**
 * Reads the space- or tab-separated numbers of one line into `out` from `offset`, at most `room` of them,
 * and returns how many tokens the line holds. A hand-written scanner instead of a regex or a split per
 * value, because 100,000-line files must read in well under a second: a plain decimal whose digits fit
 * 2^53 with at most 22 decimals is built as mantissa / 10^k, correctly rounded because both are exact
 * doubles (Clinger 1990, PLDI, "How to read floating point numbers accurately"); anything else goes
 * through Number(). Text tokens become NaN and are passed to `onText`.
 *
 * @example
 * const out = new Float64Array(3);
 * scanNumbers(' 1500.5  -999.25\tabc', out, 0, 3, (t) => console.log(t)); // → 3; out = [1500.5, -999.25, NaN]; logs 'abc'
 */
export function scanNumbers(
  s: string,
  out: Float64Array,
  offset: number,
  room: number,
  onText: (token: string, position: number) => void,
): number {
  let count = 0;
  let i = 0;
  const n = s.length;
  while (i < n) {
    let c = s.charCodeAt(i);
    if (c === 32 || c === 9) {
      i++;
      continue;
    }
    const start = i;
    let negative = false;
    if (c === 45 || c === 43) {
      negative = c === 45;
      i++;
    }
    let mantissa = 0;
    let digits = 0;
    let decimals = -1; // digits after the dot; -1 before a dot is seen
    let plain = true; // only digits and at most one dot after the sign
    while (i < n) {
      c = s.charCodeAt(i);
      if (c === 32 || c === 9) break;
      if (c >= 48 && c <= 57) {
        mantissa = mantissa * 10 + (c - 48);
        digits++;
        if (decimals >= 0) decimals++;
      } else if (c === 46 && decimals < 0) decimals = 0;
      else plain = false;
      i++;
    }
    if (count < room) {
      let value: number;
      if (plain && digits > 0 && mantissa < MAX_EXACT_MANTISSA && decimals <= 22) {
        value = decimals > 0 ? mantissa / POW10[decimals] : mantissa;
        if (negative) value = -value;
      } else {
        const token = s.slice(start, i);
        value = isNumericToken(token) ? Number(token) : NaN;
        if (Number.isNaN(value)) onText(token, count);
      }
      out[offset + count] = value;
    }
    count++;
  }
  return count;
}

/** Decimal or exponent notation only: Number() would also take "0x1F", "Infinity" and "". */
function isNumericToken(token: string): boolean {
  return /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(token);
}
