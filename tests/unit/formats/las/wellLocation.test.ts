import { describe, expect, it } from 'vitest';
import { parseDegrees, parseLas, readLasLocation } from '../../../../shared/formats/las';

describe('parseDegrees', () => {
  it('reads decimal and sexagesimal degrees with hemisphere letters', () => {
    // 1° = 60′ = 3600″ (ISO 6709, sexagesimal degrees); S and W are negative.
    expect(parseDegrees('-32.5', 'lat')).toBe(-32.5);
    expect(parseDegrees('32.5 S', 'lat')).toBe(-32.5);
    expect(parseDegrees('N 4.25', 'lat')).toBe(4.25);
    expect(parseDegrees(`101°06'00" W`, 'lon')).toBeCloseTo(-101.1, 12);
    expect(parseDegrees('32 36 36.0 S', 'lat')).toBeCloseTo(-(32 + 36 / 60 + 36 / 3600), 12);
    expect(parseDegrees('3 DEG 30 E', 'lon')).toBe(3.5);
  });

  it('refuses what is not a coordinate of that axis', () => {
    expect(parseDegrees('32.5 E', 'lat')).toBeNull(); // a longitude's letter on a latitude
    expect(parseDegrees('-32.5 S', 'lat')).toBeNull(); // sign and letter disagree
    expect(parseDegrees('32 75 00 N', 'lat')).toBeNull(); // 75 minutes
    expect(parseDegrees('LATITUDE', 'lat')).toBeNull();
    expect(parseDegrees('1 2 3 4', 'lon')).toBeNull();
  });
});

const file = (wellItems: string, params = '') => `~VERSION INFORMATION
 VERS.   2.0 : CWLS LOG ASCII STANDARD - VERSION 2.0
 WRAP.   NO  : ONE LINE PER DEPTH STEP
~WELL INFORMATION
 STRT.M  100 : START
 STOP.M  101 : STOP
 STEP.M  1   : STEP
 NULL.   -999.25 : NULL
 WELL.   TERN-1 : WELL
${wellItems}
${params ? `~PARAMETER INFORMATION\n${params}\n` : ''}~CURVE INFORMATION
 DEPT.M  : DEPTH
 GR  .GAPI : GAMMA RAY
~A
100 50
101 60
`;

describe('readLasLocation', () => {
  it('reads LATI/LONG from ~W with their lines, and EKB/EGL from ~P in metres', () => {
    const las = parseLas(
      file(' LATI.DEG  -32.25 : LATITUDE\n LONG.DEG  101.5 W : LONGITUDE', ' EKB .FT  100 : KB\n EGL .M  12.5 : GROUND'),
    );
    const loc = readLasLocation(las);
    expect(loc.problems).toEqual([]);
    expect(loc.lat).toEqual({ mnemonic: 'LATI', value: -32.25, line: 10 });
    expect(loc.lon).toEqual({ mnemonic: 'LONG', value: -101.5, line: 11 });
    // 1 ft = 0.3048 m exactly (International Yard and Pound Agreement, 1959).
    expect(loc.datumElevation).toEqual({ mnemonic: 'EKB', value: 30.48, line: 13, kind: 'KB' });
    expect(loc.groundElevation).toEqual({ mnemonic: 'EGL', value: 12.5, line: 14 });
  });

  it('reads LAT/LON from ~P, ignores a bare label, and names an unreadable item by line', () => {
    const las = parseLas(
      file(' LATI.DEG   : LATITUDE', ' LAT .DEG  12.5 : LATITUDE\n LON .DEG  abc : LONGITUDE\n EDF .  30 : DRILL FLOOR'),
    );
    const loc = readLasLocation(las);
    expect(loc.lat).toEqual({ mnemonic: 'LAT', value: 12.5, line: 12 });
    expect(loc.lon).toBeNull();
    expect(loc.problems).toEqual([
      { line: 13, column: 'LON', message: "'abc' is not a longitude in degrees" },
      { line: 14, column: 'EDF', message: 'EDF cannot be read: it has no unit (M or FT)' },
    ]);
  });
});
