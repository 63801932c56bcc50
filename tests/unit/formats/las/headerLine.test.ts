import { describe, expect, it } from 'vitest';
import { parseHeaderLine } from '@shared/formats/las';

// The delimiter rule and the example lines come from CWLS, "LAS Version 2.0: A Digital Standard for Logs",
// January 2014 update, §5.2 (first dot, first space after it, last colon) and the examples of §5.4–5.6.
describe('parseHeaderLine', () => {
  it('splits mnemonic, unit, data and description', () => {
    expect(parseHeaderLine('BHT .DEGC 114.0000 : Bottom Hole Temperature', 7)).toEqual({
      item: { mnemonic: 'BHT', unit: 'DEGC', value: '114.0000', description: 'Bottom Hole Temperature', line: 7 },
    });
  });

  it('keeps an API code with spaces as the data of a ~C line', () => {
    expect(parseHeaderLine('RHOB .K/M3 45 350 02 00 : 2 BULK DENSITY', 30).item).toMatchObject({
      mnemonic: 'RHOB',
      unit: 'K/M3',
      value: '45 350 02 00',
      description: '2 BULK DENSITY',
    });
  });

  it('allows empty units and empty data ("DEPT.  : depth")', () => {
    expect(parseHeaderLine('DEPT.  : 1 DEPTH', 1).item).toMatchObject({ mnemonic: 'DEPT', unit: '', value: '', description: '1 DEPTH' });
    expect(parseHeaderLine('NULL. -999.25 :NULL VALUE', 1).item).toMatchObject({ unit: '', value: '-999.25', description: 'NULL VALUE' });
  });

  it('splits the description at the LAST colon, so the data may hold colons and dots', () => {
    expect(parseHeaderLine('DATE.   2024-03-14 10:42:00 : LOG DATE', 1).item).toMatchObject({
      value: '2024-03-14 10:42:00',
      description: 'LOG DATE',
    });
    expect(parseHeaderLine('UWI . 100123401234W500 :UNIQUE WELL ID', 1).item).toMatchObject({ mnemonic: 'UWI', value: '100123401234W500' });
  });

  it('ends the unit at the colon when no space comes first ("STRT.M:")', () => {
    expect(parseHeaderLine('DEPT.M:depth', 1).item).toMatchObject({ mnemonic: 'DEPT', unit: 'M', value: '', description: 'depth' });
  });

  it('reports a line without a dot or without a colon and still reads it', () => {
    expect(parseHeaderLine('WRAP   NO : one line per depth', 4)).toEqual({
      item: { mnemonic: 'WRAP', unit: '', value: 'NO', description: 'one line per depth', line: 4 },
      problem: 'no dot after the mnemonic (expected MNEM.UNIT VALUE : DESCRIPTION)',
    });
    expect(parseHeaderLine('STRT.M 1500.0', 5)).toEqual({
      item: { mnemonic: 'STRT', unit: 'M', value: '1500.0', description: '', line: 5 },
      problem: 'no colon before the description (expected MNEM.UNIT VALUE : DESCRIPTION)',
    });
  });
});
