/**
 * The shortest decimal text that reads back as exactly the same double, without an exponent (LAS 2.0
 * data are plain floating point or integer values, §3.0). JavaScript's own shortest form is used and its
 * exponent, if any, is moved into the digits.
 *
 * @example
 * formatLasNumber(1e-7);    // → '0.0000001'
 * formatLasNumber(2.5e21);  // → '2500000000000000000000'
 * formatLasNumber(-999.25); // → '-999.25'
 */
export function formatLasNumber(value: number): string {
  if (!Number.isFinite(value)) throw new Error(`formatLasNumber: ${value} is not a finite number`);
  const shortest = String(value);
  const e = shortest.indexOf('e');
  if (e < 0) return shortest;

  const negative = shortest.startsWith('-');
  const mantissa = shortest.slice(negative ? 1 : 0, e);
  const exponent = Number(shortest.slice(e + 1));
  const dot = mantissa.indexOf('.');
  const digits = mantissa.replace('.', '');
  const pointAt = (dot < 0 ? mantissa.length : dot) + exponent; // position of the decimal point in `digits`
  let text: string;
  if (pointAt <= 0) text = `0.${'0'.repeat(-pointAt)}${digits}`;
  else if (pointAt >= digits.length) text = digits + '0'.repeat(pointAt - digits.length);
  else text = `${digits.slice(0, pointAt)}.${digits.slice(pointAt)}`;
  return negative ? `-${text}` : text;
}
