/**
 * Units that may follow a column name after a space, underscore or hyphen ("depth_m", "EMW ppg").
 * Only known spellings count, so that "well_name" keeps its name. Lower case.
 */
const SUFFIX_UNITS = new Set([
  'm',
  'ft',
  'km',
  'mm',
  'in',
  'psi',
  'psia',
  'psig',
  'pa',
  'kpa',
  'mpa',
  'bar',
  'ppg',
  'sg',
  'g/cc',
  'g/cm3',
  'kg/m3',
  'psi/ft',
  'kpa/m',
  'mpa/km',
  'us/ft',
  'us/m',
  'ohmm',
  'ohm.m',
  'gapi',
  'degc',
  'degf',
  '°c',
  '°f',
  'deg',
  'lb/gal',
]);

const BRACKETED = /^(.*?)\s*[([]\s*([^)\]]*?)\s*[)\]]\s*$/;
const SUFFIXED = /^(.*?)[\s_-]+([^\s_-]+)$/;

export interface HeaderName {
  name: string;
  unit?: string;
}

/**
 * Splits a unit off a column header: anything in brackets at the end ("MD (ft)", "Pressure [psi]"), or a
 * known unit after a space, underscore or hyphen ("depth_m", "EMW ppg"). The unit is returned as written.
 *
 * @example
 * splitHeaderUnit('Pressure [psi]'); // → { name: 'Pressure', unit: 'psi' }
 * splitHeaderUnit('depth_m');        // → { name: 'depth', unit: 'm' }
 * splitHeaderUnit('well_name');      // → { name: 'well_name' }
 */
export function splitHeaderUnit(header: string): HeaderName {
  const text = header.trim();
  const bracketed = BRACKETED.exec(text);
  if (bracketed && bracketed[1] !== '' && bracketed[2] !== '') return { name: bracketed[1], unit: bracketed[2] };
  const suffixed = SUFFIXED.exec(text);
  if (suffixed && suffixed[1] !== '' && SUFFIX_UNITS.has(suffixed[2].toLowerCase())) return { name: suffixed[1], unit: suffixed[2] };
  return { name: text };
}
