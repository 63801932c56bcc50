import { describe, expect, it } from 'vitest';
import {
  formatAreaKm2,
  formatAzimuth,
  formatCursor,
  formatDecimalDegrees,
  formatDegreesMinutes,
  formatKm,
  formatM,
  formatPercent,
  formatRangeM,
  formatSignedM,
} from './format';

describe('coordinates', () => {
  // 1° = 60′ (sexagesimal definition); hemisphere letters as in ISO 6709 Annex D.
  it('writes degrees and decimal minutes with the hemisphere', () => {
    expect(formatDegreesMinutes(-32.5, 'lat')).toBe('32°30.00′S');
    expect(formatDegreesMinutes(-101.2, 'lon')).toBe('101°12.00′W');
    expect(formatDegreesMinutes(51.477928, 'lat')).toBe('51°28.68′N'); // 0.477928 × 60 = 28.67568′
    expect(formatDegreesMinutes(0.0166667, 'lon')).toBe('0°01.00′E');
  });

  it('carries 59.999′ into the next degree instead of writing 60.00′', () => {
    expect(formatDegreesMinutes(32.99999, 'lat')).toBe('33°00.00′N');
    expect(formatDegreesMinutes(-179.999999, 'lon')).toBe('180°00.00′W');
  });

  it('refuses values off the globe with the axis named', () => {
    expect(() => formatDegreesMinutes(91, 'lat')).toThrow('formatDegreesMinutes: lat must be within −90..90, got 91.');
    expect(() => formatDegreesMinutes(Number.NaN, 'lon')).toThrow('formatDegreesMinutes: value must be a finite number, got NaN.');
  });

  it('writes decimal degrees without a negative zero', () => {
    expect(formatDecimalDegrees(-32.451234)).toBe('-32.45123');
    expect(formatDecimalDegrees(-0.000001)).toBe('0.00000');
    expect(formatDecimalDegrees(101.23456789, 4)).toBe('101.2346');
    expect(formatCursor(-101.2, -32.5)).toEqual({ decimal: '-101.20000, -32.50000', dm: '32°30.00′S 101°12.00′W' });
  });
});

describe('table values', () => {
  // 16-point compass rose: 22.5° per point, N at 0°, clockwise.
  it.each([
    [0, '000° N'],
    [11.2, '011° N'],
    [11.3, '011° N'],
    [12, '012° NNE'],
    [47.6, '048° NE'],
    [180, '180° S'],
    [359.6, '000° N'],
    [-90, '270° W'],
  ])('azimuth %s → %s', (deg, text) => {
    expect(formatAzimuth(deg)).toBe(text);
  });

  it('writes distances, depths, differences and ratios for people', () => {
    expect(formatKm(3.456)).toBe('3.5 km');
    expect(formatKm(250.4)).toBe('250 km');
    expect(formatM(3250.4)).toBe(new Intl.NumberFormat('en-US').format(3250) + ' m');
    expect(formatM(null)).toBe('—');
    expect(formatSignedM(-12.4)).toBe('−12 m');
    expect(formatSignedM(1499.6)).toBe('+1,500 m');
    expect(formatSignedM(0.3)).toBe('0 m');
    expect(formatSignedM(null)).toBe('—');
    expect(formatPercent(0.874)).toBe('87 %');
    expect(formatPercent(1.25)).toBe('125 %');
    expect(formatAreaKm2(12.3456)).toBe('12.3 km²');
    expect(formatAreaKm2(0.5)).toBe('0.50 km²');
    expect(formatRangeM(2300, 3100.4)).toBe('2,300 – 3,100 m');
    expect(formatRangeM(null, 3100)).toBe('— – 3,100 m');
    expect(formatRangeM(null, null)).toBe('—');
  });

  it('refuses impossible values', () => {
    expect(() => formatKm(-1)).toThrow('formatKm: distance must be a finite number ≥ 0, got -1.');
    expect(() => formatPercent(Number.POSITIVE_INFINITY)).toThrow('formatPercent: ratio must be a finite number or null, got Infinity.');
  });
});
