import { describe, expect, it } from 'vitest';
import { convert } from '@shared/units';
import { emwFromPressure, formatPlotValue, plotValue, valueAxisLabel } from './valueAxis';

const psi = (v: number) => convert(v, 'psi', 'Pa');
const ft = (v: number) => convert(v, 'ft', 'm');

describe('pressure and EMW views', () => {
  it('5,200 psi at 10,000 ft TVD is 10.0 ppg: 5200 / (0.051948 × 10000), with 0.051948 = 12/231 psi/ft per ppg', () => {
    const byHand = 5200 / ((12 / 231) * 10_000); // 10.0100 ppg
    expect(emwFromPressure(psi(5200), ft(10_000), 'ppg')).toBeCloseTo(byHand, 9);
    expect(byHand.toFixed(1)).toBe('10.0');
  });

  it('the same point as a gradient: 0.52 psi/ft, 11.763 kPa/m (1 psi/ft = 22.62059 kPa/m) and 1.1995 SG (1 SG = 8.345404 ppg)', () => {
    expect(emwFromPressure(psi(5200), ft(10_000), 'psi/ft')).toBeCloseTo(0.52, 12);
    expect(emwFromPressure(psi(5200), ft(10_000), 'kPa/m')).toBeCloseTo(0.52 * 22.62059, 4);
    expect(emwFromPressure(psi(5200), ft(10_000), 'sg')).toBeCloseTo(10.01 / 8.345404, 3);
  });

  it('pressure view converts the unit only; EMW at the datum is undefined', () => {
    expect(plotValue(30e6, 3000, 'pressure', { pressure: 'MPa', emw: 'sg' })).toBe(30);
    expect(plotValue(psi(5200), 1, 'pressure', { pressure: 'psi', emw: 'sg' })).toBeCloseTo(5200, 9);
    expect(emwFromPressure(1e6, 0, 'sg')).toBeNaN();
  });

  it('labels axis and hover with units', () => {
    expect(valueAxisLabel('pressure', { pressure: 'psi', emw: 'sg' })).toBe('Pressure (psi)');
    expect(valueAxisLabel('emw', { pressure: 'psi', emw: 'sg' })).toBe('Equivalent mud weight from rotary table (SG)');
    expect(valueAxisLabel('emw', { pressure: 'psi', emw: 'kPa/m' })).toBe('Pressure gradient from rotary table (kPa/m)');
    expect(formatPlotValue(10.0123, 'emw', { pressure: 'MPa', emw: 'ppg' })).toBe('10.01 ppg');
    expect(formatPlotValue(5200.4, 'pressure', { pressure: 'psi', emw: 'ppg' })).toBe('5,200 psi');
  });
});
