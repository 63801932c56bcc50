import { describe, expect, it } from 'vitest';
import { normaliseDepthUnit, suggestCurveRole } from '@shared/formats/las';

// Mnemonic conventions: common practice, no source (each contractor names curves its own way). The
// example mnemonics and units are those of the CWLS LAS 2.0 standard's own ~C example (§5.5).
describe('suggestCurveRole', () => {
  it.each([
    ['DT', 'US/M', 'sonic'],
    ['DTC', 'us/ft', 'sonic'],
    ['DTCO', 'US/F', 'sonic'],
    ['AC', 'us/ft', 'sonic'],
    ['RES', 'OHMM', 'resistivity'],
    ['RT', 'ohmm', 'resistivity'],
    ['ILD', 'OHMM', 'resistivity'],
    ['LLD', 'OHMM', 'resistivity'],
    ['RDEP', 'ohm.m', 'resistivity'],
    ['AT90', 'OHMM', 'resistivity'],
    ['MSFL', 'OHMM', 'resistivity'],
    ['RHOB', 'K/M3', 'density'],
    ['DEN', 'g/cc', 'density'],
    ['ZDEN', 'G/C3', 'density'],
    ['GR', 'GAPI', 'gamma'],
    ['SGR', 'GAPI', 'gamma'],
    ['CALI', 'MM', 'caliper'],
    ['HCAL', 'IN', 'caliper'],
    ['NPHI', 'V/V', 'neutron'],
    ['TNPH', 'PU', 'neutron'],
    ['PHIE', 'V/V', 'porosity'],
    ['DPHI', 'V/V', 'porosity'],
    ['SP', 'MV', 'other'],
    ['DTSM', 'us/ft', 'other'],
    ['DRHO', 'G/CC', 'other'],
  ] as const)('%s [%s] → %s', (mnemonic, unit, role) => {
    expect(suggestCurveRole(mnemonic, unit)).toBe(role);
  });

  it('ignores case and a duplicate suffix, and falls back on the unit', () => {
    expect(suggestCurveRole('gr:2', '')).toBe('gamma');
    expect(suggestCurveRole('XSONIC7', 'µs/ft')).toBe('sonic');
    expect(suggestCurveRole('DEEPRES', 'ohm-m')).toBe('resistivity');
    expect(suggestCurveRole('BULK', 'kg/m3')).toBe('density');
    expect(suggestCurveRole('XYZ', 'MV')).toBe('other');
  });
});

describe('normaliseDepthUnit', () => {
  it('knows the standard depth units M, F, FT (CWLS LAS 2.0, §5.4) in any case', () => {
    expect(['M', 'm', 'F', 'FT', 'ft', 'FEET', 'metres'].map(normaliseDepthUnit)).toEqual(['m', 'm', 'ft', 'ft', 'ft', 'ft', 'm']);
    expect(normaliseDepthUnit('S')).toBeNull();
    expect(normaliseDepthUnit('')).toBeNull();
  });
});
