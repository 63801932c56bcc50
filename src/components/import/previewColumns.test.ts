import { describe, expect, it } from 'vitest';
import { columnsWithValues, PREVIEW_COLUMNS, previewCell, previewTitle } from './previewColumns';

const inField = { depth: 'ft' as const, pressure: 'psi' as const, emw: 'ppg' as const };
const spec = (kind: keyof typeof PREVIEW_COLUMNS, key: string) => PREVIEW_COLUMNS[kind].find((c) => c.key === key)!;

describe('preview cells', () => {
  it('shows the SI values of a pressure row in the reader units, with the unit in the title', () => {
    // A 16.5 ppg LOT at 1500 m TVD: EMW 16.5 × 119.826427 kg/m³; p = ρ·g·TVD with g = 9.80665 m/s².
    const emwKgM3 = 16.5 * 119.826427;
    const row = {
      line: 3,
      wellName: 'TEST-2',
      kind: 'lot',
      mdM: 1524,
      tvdM: 1500,
      valueEntered: 16.5,
      unitEntered: 'ppg',
      pressurePa: emwKgM3 * 9.80665 * 1500,
      emwKgM3,
    };
    expect(previewCell(spec('pressures', 'kind'), row, inField)).toBe('Leak-off test');
    expect(previewCell(spec('pressures', 'mdM'), row, inField)).toBe('5,000'); // 1524 m = 5000 ft
    expect(previewCell(spec('pressures', 'emwKgM3'), row, inField)).toBe('16.5');
    // 0.051948 psi/ft per ppg (12/231) × 16.5 ppg × 4921.26 ft = 4218.2 psi.
    expect(previewCell(spec('pressures', 'pressurePa'), row, inField)).toBe('4,218');
    expect(previewCell(spec('pressures', 'valueEntered'), row, inField)).toBe('16.5 ppg');
    expect(previewCell(spec('pressures', 'quality'), { quality: 'unknown' }, inField)).toBe('Not graded');
    expect(previewTitle(spec('pressures', 'pressurePa'), inField)).toBe('Pressure (psi)');
    expect(previewTitle(spec('pressures', 'tvdM'), inField)).toBe('TVD (ft)');
  });

  it('shows missing values as a dash rather than blank or zero', () => {
    expect(previewCell(spec('wells', 'waterDepthM'), { waterDepthM: null }, inField)).toBe('—');
    expect(previewCell(spec('wells', 'uwi'), { uwi: null }, inField)).toBe('—');
  });
});

describe('columnsWithValues', () => {
  it('drops the columns no previewed row fills, and keeps all when no row is valid', () => {
    const rows = [{ line: 2, wellName: 'A', name: 'Top X', mdM: 1500, tvdM: 1490, lithology: null }];
    expect(columnsWithValues(PREVIEW_COLUMNS.tops, rows).map((c) => c.key)).toEqual(['wellName', 'name', 'mdM', 'tvdM']);
    expect(columnsWithValues(PREVIEW_COLUMNS.tops, [])).toHaveLength(PREVIEW_COLUMNS.tops.length);
  });
});
