import { describe, expect, it } from 'vitest';
import { parseNumber } from '@shared/formats/csv';

// Decimal comma and thousands grouping as written in the CLDR number symbols for de/fr (',' decimal,
// '.' group) and en ('.' decimal, ',' group) (value recalled from memory).
describe('parseNumber', () => {
  it('reads plain decimals and exponents, and trims spaces', () => {
    expect(parseNumber('1234.5', { decimalComma: false })).toBe(1234.5);
    expect(parseNumber(' -0.25 ', { decimalComma: false })).toBe(-0.25);
    expect(parseNumber('1.5e3', { decimalComma: false })).toBe(1500);
    expect(parseNumber('.5', { decimalComma: false })).toBe(0.5);
  });

  it('returns null for an empty cell and NaN for text', () => {
    expect(parseNumber('', { decimalComma: false })).toBeNull();
    expect(parseNumber('   ', { decimalComma: true })).toBeNull();
    for (const text of ['abc', '0x1F', 'Infinity', '1.2.3', '12 m', '--1']) expect(parseNumber(text, { decimalComma: false })).toBeNaN();
  });

  it('reads decimal commas and dot grouping when asked', () => {
    expect(parseNumber('1234,5', { decimalComma: true })).toBe(1234.5);
    expect(parseNumber('1.234,5', { decimalComma: true })).toBe(1234.5);
    expect(parseNumber('-0,75', { decimalComma: true })).toBe(-0.75);
    expect(parseNumber('12.5', { decimalComma: true })).toBe(12.5);
    expect(parseNumber('1234,5', { decimalComma: false })).toBeNaN();
  });

  it('reads comma grouping in point-decimal files', () => {
    expect(parseNumber('1,234.5', { decimalComma: false })).toBe(1234.5);
    expect(parseNumber('12,34', { decimalComma: false })).toBeNaN();
  });
});
