import { describe, expect, it } from 'vitest';
import {
  depthIn,
  depthToMetres,
  doglegIn,
  emwIn,
  formatDepth,
  formatEmw,
  formatNumber,
  formatPressure,
  MISSING,
  unitLabel,
} from './quantities';

describe('depths', () => {
  it('reads metres in feet by the international foot', () => {
    // 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959).
    expect(depthIn(0.3048, 'ft')).toBeCloseTo(1, 12);
    expect(depthIn(1000, 'ft')).toBeCloseTo(3280.839895, 6);
    expect(depthToMetres(10_000, 'ft')).toBeCloseTo(3048, 9);
    expect(depthIn(1234.5, 'm')).toBe(1234.5);
  });

  it('formats with grouping, a tenth by default, and a dash for missing values', () => {
    expect(formatDepth(1441.5, 'ft')).toBe('4,729.3'); // 1441.5 / 0.3048 = 4729.33
    expect(formatDepth(null, 'm')).toBe(MISSING);
    expect(formatNumber(Number.NaN)).toBe(MISSING);
    expect(formatNumber(4593.990654, 0)).toBe('4,594');
  });
});

describe('pressures and equivalent mud weights', () => {
  it('shows Pa in psi, bar and MPa', () => {
    // 1 psi = 6894.757293168 Pa (NIST SP 811); 1 bar = 100 kPa (SI brochure).
    expect(formatPressure(6894.757293168 * 5000, 'psi')).toBe('5,000');
    expect(formatPressure(27.5e6, 'bar')).toBe('275');
    expect(formatPressure(27.5e6, 'MPa')).toBe('27.5');
  });

  it('turns an EMW in kg/m³ into ppg, sg, kPa/m and psi/ft', () => {
    // 1 sg = 8.345404 ppg (1 US gal = 231 in³, 1 lb = 0.45359237 kg); 1 sg gradient = 9.80665 kPa/m (standard gravity);
    // 1 psi/ft = 22.62059 kPa/m, so 1 sg = 0.433527 psi/ft. Exact factors: docs/sources.md [units].
    expect(emwIn(1000, 'ppg')).toBeCloseTo(8.345404, 6);
    expect(emwIn(1000, 'sg')).toBeCloseTo(1, 12);
    expect(emwIn(1000, 'kPa/m')).toBeCloseTo(9.80665, 9);
    expect(emwIn(1000, 'psi/ft')).toBeCloseTo(9.80665 / 22.62059, 6);
    // A 16.5 ppg leak-off test: 16.5 × 119.826427 kg/m³.
    expect(formatEmw(16.5 * 119.826427, 'ppg')).toBe('16.5');
    expect(formatEmw(1160, 'sg')).toBe('1.16');
    expect(formatEmw(null, 'sg')).toBe(MISSING);
  });
});

describe('dogleg severity', () => {
  it('reads °/30 m as °/100 ft over the longer course length', () => {
    // 100 ft = 30.48 m, so the same curvature is 1.016 times larger per 100 ft.
    expect(doglegIn(3, 'ft')).toBeCloseTo(3.048, 12);
    expect(doglegIn(3, 'm')).toBe(3);
  });
});

describe('unitLabel', () => {
  it('writes superscripts and the degree sign, and passes unknown names through', () => {
    expect(unitLabel('kg/m3')).toBe('kg/m³');
    expect(unitLabel('deg')).toBe('°');
    expect(unitLabel('gAPI')).toBe('gAPI');
  });
});
