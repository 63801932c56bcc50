import { describe, expect, it } from 'vitest';
import { splitHeaderUnit, suggestColumnMatches, suggestMapping } from '@shared/formats/csv';

const FIELDS = [
  { key: 'md', aliases: ['measured depth', 'depth', 'MD_RKB'] },
  { key: 'tvd', aliases: ['true vertical depth'] },
  { key: 'pressure', aliases: ['pore pressure', 'pp', 'Druck'] },
  { key: 'emw', aliases: ['equivalent mud weight', 'mud weight equivalent'] },
  { key: 'well', aliases: ['well name', 'Bohrung'] },
];

describe('splitHeaderUnit', () => {
  it.each([
    ['MD (ft)', { name: 'MD', unit: 'ft' }],
    ['depth_m', { name: 'depth', unit: 'm' }],
    ['Pressure [psi]', { name: 'Pressure', unit: 'psi' }],
    ['EMW ppg', { name: 'EMW', unit: 'ppg' }],
    ['Temperatur (°C)', { name: 'Temperatur', unit: '°C' }],
    ['gradient_psi/ft', { name: 'gradient', unit: 'psi/ft' }],
    ['well_name', { name: 'well_name' }],
    ['TVD SS', { name: 'TVD SS' }],
  ])('%s', (header, expected) => {
    expect(splitHeaderUnit(header)).toEqual(expected);
  });
});

describe('suggestMapping', () => {
  it('matches aliases ignoring case, spaces and underscores, and reads units from the header', () => {
    const header = ['Well Name', 'MD (ft)', 'True_Vertical_Depth [m]', 'Pressure [psi]', 'EMW ppg', 'comment'];
    expect(suggestColumnMatches(header, FIELDS)).toEqual([
      { column: 'Well Name', field: 'well' },
      { column: 'MD (ft)', field: 'md', unit: 'ft' },
      { column: 'True_Vertical_Depth [m]', field: 'tvd', unit: 'm' },
      { column: 'Pressure [psi]', field: 'pressure', unit: 'psi' },
      { column: 'EMW ppg', field: 'emw', unit: 'ppg' },
      { column: 'comment', field: null },
    ]);
    expect(suggestMapping(header, FIELDS)).toEqual({
      'Well Name': 'well',
      'MD (ft)': 'md',
      'True_Vertical_Depth [m]': 'tvd',
      'Pressure [psi]': 'pressure',
      'EMW ppg': 'emw',
      comment: null,
    });
  });

  it('prefers the whole header when it is an alias, and gives each field to the first column only', () => {
    expect(suggestMapping(['md_rkb', 'depth_m', 'Druck [bar]', 'pp'], FIELDS)).toEqual({
      md_rkb: 'md',
      depth_m: null,
      'Druck [bar]': 'pressure',
      pp: null,
    });
  });
});
