/**
 * A typed number checked against a field's allowed range. Out-of-range values are brought to the nearest limit and
 * the reader is told, so a typed −2 never turns into 0.1 unseen.
 * @example clampTyped(-2, 0.1, 10); // { value: 0.1, message: '−2 is below the lowest allowed, 0.1: set to 0.1.' }
 */
export function clampTyped(value: number, min?: number, max?: number): { value: number; message: string | null } {
  const show = (v: number) => String(v).replace('-', '−');
  if (min !== undefined && value < min)
    return { value: min, message: `${show(value)} is below the lowest allowed, ${show(min)}: set to ${show(min)}.` };
  if (max !== undefined && value > max)
    return { value: max, message: `${show(value)} is above the highest allowed, ${show(max)}: set to ${show(max)}.` };
  return { value, message: null };
}
