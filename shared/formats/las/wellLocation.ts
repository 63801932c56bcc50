import type { Problem } from '../problem';
import { normaliseDepthUnit, METRES_PER_FOOT } from './depthUnit';
import type { HeaderItem, LasFile } from './types';

/** One coordinate read from a ~W or ~P item, with the line it came from. */
export interface LasCoordinate {
  mnemonic: string;
  value: number;
  line: number;
}

/** Where a LAS file says its well is, and its datum elevations; every field null when the file does not say. */
export interface LasWellLocation {
  lat: LasCoordinate | null;
  lon: LasCoordinate | null;
  /** Projected surface coordinates, in a CRS the file does not name (the user gives its EPSG code). */
  x: LasCoordinate | null;
  y: LasCoordinate | null;
  /** GDAT (geodetic datum) as written; '' when none. */
  geodeticDatum: string;
  /**
   * Kelly bushing (EKB) or else drill floor (EDF) elevation, m; else, by the LAS 2.0 definitions, the
   * permanent datum's elevation (EPD) plus the log reference's height above it (APD), kind 'RT'.
   */
  datumElevation: (LasCoordinate & { kind: 'KB' | 'DF' | 'RT' }) | null;
  /** Water depth (WDEP, WD, or an item described as water depth), m; its presence says the well is offshore. */
  waterDepth: LasCoordinate | null;
  /** Ground level (EGL) elevation, m. */
  groundElevation: LasCoordinate | null;
  /** Items that are present but unreadable, each with its line. */
  problems: Problem[];
}

// The spellings seen in ~W and ~P sections: LATI/LONG are the LAS 2.0 and 3.0 names, the rest are common practice, no source.
const LAT_NAMES = ['LATI', 'LAT', 'LATITUDE'];
const LON_NAMES = ['LONG', 'LON', 'LONGITUDE'];
const X_NAMES = ['X', 'XCOORD', 'X_COORD'];
const Y_NAMES = ['Y', 'YCOORD', 'Y_COORD'];

/**
 * Degrees from decimal ("-32.5", "32.5 S") or degree-minute-second ("32 30 15.2 S", `32°30'15.2"S`) text.
 * A hemisphere letter must suit the axis (N/S for latitude, E/W for longitude); null when unreadable.
 * @example parseDegrees(`101°06'00" W`, 'lon') // -101.1
 */
export function parseDegrees(text: string, axis: 'lat' | 'lon'): number | null {
  const s = text
    .trim()
    .toUpperCase()
    .replace(/DEG(REES?)?/g, ' ');
  const letters = s.replace(/[^A-Z]/g, '');
  if (letters.length > 1 || (letters && !(axis === 'lat' ? 'NS' : 'EW').includes(letters))) return null;
  if (/[^0-9NSEW.\s°'"′″:+-]/.test(s)) return null;
  const numbers = s.match(/[-+]?(\d+(\.\d*)?|\.\d+)/g);
  if (!numbers || numbers.length > 3) return null;
  const [d, m = 0, sec = 0] = numbers.map(Number);
  if (numbers.slice(1).some((n) => /^[-+]/.test(n)) || m >= 60 || sec >= 60) return null;
  const negative = d < 0 || numbers[0].startsWith('-');
  if (negative && letters) return null;
  const value = (Math.abs(d) + m / 60 + sec / 3600) * (negative || letters === 'S' || letters === 'W' ? -1 : 1);
  return Number.isFinite(value) ? value : null;
}

/**
 * Reads the well's location and datum elevations from ~W, then ~P (LAS 2.0 puts LATI/LONG in ~W by
 * common use, LAS 3.0 in ~P; EKB/EDF/EGL are ~P items in the CWLS LAS 2.0 examples).
 * @example readLasLocation(parseLas(text)).lat?.value // 32.5
 */
export function readLasLocation(las: Pick<LasFile, 'well' | 'parameters'>): LasWellLocation {
  const items = [...las.well.items, ...las.parameters];
  const problems: Problem[] = [];
  const find = (names: string[]): HeaderItem | undefined =>
    items.find((i) => names.includes(i.mnemonic.toUpperCase()) && valueOf(i) !== '');
  const degrees = (names: string[], axis: 'lat' | 'lon'): LasCoordinate | null => {
    const item = find(names);
    if (!item) return null;
    const value = parseDegrees(valueOf(item), axis);
    if (value === null) {
      problems.push({
        line: item.line,
        column: item.mnemonic,
        message: `'${valueOf(item)}' is not a ${axis === 'lat' ? 'latitude' : 'longitude'} in degrees`,
      });
      return null;
    }
    return { mnemonic: item.mnemonic, value, line: item.line };
  };
  const number = (names: string[], depth: boolean): LasCoordinate | null => {
    const item = find(names);
    if (!item) return null;
    const value = Number(valueOf(item));
    const unit = depth ? normaliseDepthUnit(item.unit) : 'm';
    if (!Number.isFinite(value) || unit === null) {
      const why = !Number.isFinite(value)
        ? `'${valueOf(item)}' is not a number`
        : item.unit
          ? `its unit '${item.unit}' is not M or FT`
          : 'it has no unit (M or FT)';
      problems.push({ line: item.line, column: item.mnemonic, message: `${item.mnemonic} cannot be read: ${why}` });
      return null;
    }
    return { mnemonic: item.mnemonic, value: unit === 'ft' ? value * METRES_PER_FOOT : value, line: item.line };
  };
  const lat = degrees(LAT_NAMES, 'lat');
  const lon = degrees(LON_NAMES, 'lon');
  const x = number(X_NAMES, false);
  const y = number(Y_NAMES, false);
  const kb = number(['EKB'], true);
  const df = kb ? null : number(['EDF'], true);
  const epd = kb || df ? null : number(['EPD'], true);
  const apd = epd ? number(['APD'], true) : null;
  // Mnemonics vary by vendor (WDEP, WD, WATD; common practice, no source): the description settles it.
  const wdItem = items.find(
    (i) =>
      (['WDEP', 'WD', 'WATD', 'WDEPTH'].includes(i.mnemonic.toUpperCase()) || /water\s*depth/i.test(i.description)) && valueOf(i) !== '',
  );
  const waterDepth = wdItem ? number([wdItem.mnemonic.toUpperCase()], true) : null;
  const groundElevation = number(['EGL'], true);
  const gdat = find(['GDAT']);
  return {
    lat,
    lon,
    x,
    y,
    geodeticDatum: gdat ? valueOf(gdat) : '',
    datumElevation: kb
      ? { ...kb, kind: 'KB' }
      : df
        ? { ...df, kind: 'DF' }
        : epd
          ? { ...epd, value: epd.value + (apd?.value ?? 0), mnemonic: apd ? `${epd.mnemonic}+${apd.mnemonic}` : epd.mnemonic, kind: 'RT' }
          : null,
    waterDepth,
    groundElevation,
    problems: problems.sort((a, b) => a.line - b.line),
  };
}

/** LAS 1.2 files often leave DATA empty and write the value after the colon; a bare label there ("LATITUDE") is no value. */
function valueOf(item: HeaderItem): string {
  return item.value.trim() || (/\d/.test(item.description) ? item.description.trim() : '');
}
