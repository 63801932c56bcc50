/**
 * How the Atlas writes coordinates, distances and ratios. Written here because each is a line or two
 * and the map, the tables and the cards must agree.
 */

/**
 * Decimal degrees with a fixed number of decimals (5 decimals ≈ 1 m of latitude).
 * @example formatDecimalDegrees(-32.451234) // '-32.45123'
 */
export function formatDecimalDegrees(value: number, decimals = 5): string {
  if (!Number.isFinite(value)) throw new Error(`formatDecimalDegrees: value must be a finite number, got ${value}.`);
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 10)
    throw new Error(`formatDecimalDegrees: decimals must be 0–10, got ${decimals}.`);
  const text = value.toFixed(decimals);
  // -0.00000 would read as a hemisphere that is not there.
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/**
 * Degrees and decimal minutes with the hemisphere letter, the compact form used on charts.
 * @example formatDegreesMinutes(-32.5, 'lat') // '32°30.00′S'
 * @example formatDegreesMinutes(-101.2, 'lon') // '101°12.00′W'
 */
export function formatDegreesMinutes(value: number, axis: 'lat' | 'lon', minuteDecimals = 2): string {
  if (!Number.isFinite(value)) throw new Error(`formatDegreesMinutes: value must be a finite number, got ${value}.`);
  const limit = axis === 'lat' ? 90 : 180;
  if (Math.abs(value) > limit) throw new Error(`formatDegreesMinutes: ${axis} must be within −${limit}..${limit}, got ${value}.`);
  const hemisphere = axis === 'lat' ? (value < 0 ? 'S' : 'N') : value < 0 ? 'W' : 'E';
  const scale = 10 ** minuteDecimals;
  // Round in whole hundredths of a minute first so 59.999′ carries into the next degree instead of reading 60.00′.
  const totalMinutes = Math.round(Math.abs(value) * 60 * scale) / scale;
  const degrees = Math.floor(totalMinutes / 60 + 1e-12);
  const minutes = totalMinutes - degrees * 60;
  return `${degrees}°${Math.max(0, minutes)
    .toFixed(minuteDecimals)
    .padStart(minuteDecimals + 3, '0')}′${hemisphere}`;
}

/**
 * The cursor readout: longitude and latitude in decimal degrees and in degrees-minutes.
 * @example formatCursor(-101.2, -32.5) // { decimal: '-101.20000, -32.50000', dm: '32°30.00′S 101°12.00′W' }
 */
export function formatCursor(lon: number, lat: number): { decimal: string; dm: string } {
  return {
    decimal: `${formatDecimalDegrees(lon)}, ${formatDecimalDegrees(lat)}`,
    dm: `${formatDegreesMinutes(lat, 'lat')} ${formatDegreesMinutes(lon, 'lon')}`,
  };
}

/**
 * A distance in kilometres: one decimal under 100 km, whole kilometres above.
 * @example formatKm(3.456) // '3.5 km'
 */
export function formatKm(km: number): string {
  if (!Number.isFinite(km) || km < 0) throw new Error(`formatKm: distance must be a finite number ≥ 0, got ${km}.`);
  return km < 100 ? `${km.toFixed(1)} km` : `${Math.round(km)} km`;
}

/**
 * An azimuth in whole degrees clockwise from north, 0–359, with its 16-point compass name.
 * @example formatAzimuth(47.6) // '048° NE'
 */
export function formatAzimuth(deg: number): string {
  if (!Number.isFinite(deg)) throw new Error(`formatAzimuth: azimuth must be a finite number, got ${deg}.`);
  const whole = ((Math.round(deg) % 360) + 360) % 360;
  const points = ['N', 'NNE', 'NE', 'ENE', 'E', 'ESE', 'SE', 'SSE', 'S', 'SSW', 'SW', 'WSW', 'W', 'WNW', 'NW', 'NNW'];
  const name = points[Math.round(whole / 22.5) % 16];
  return `${String(whole).padStart(3, '0')}° ${name}`;
}

/**
 * A signed difference in metres (offset minus planned), or a dash when unknown.
 * @example formatSignedM(-12.4) // '−12 m'
 */
export function formatSignedM(m: number | null): string {
  if (m === null) return '—';
  if (!Number.isFinite(m)) throw new Error(`formatSignedM: value must be a finite number or null, got ${m}.`);
  const r = Math.round(m);
  if (r === 0) return '0 m';
  return `${r > 0 ? '+' : '−'}${Math.abs(r).toLocaleString('en-US')} m`;
}

/**
 * A depth or length in whole metres, or a dash when unknown.
 * @example formatM(3250.4) // '3,250 m'
 */
export function formatM(m: number | null | undefined): string {
  if (m === null || m === undefined) return '—';
  if (!Number.isFinite(m)) throw new Error(`formatM: value must be a finite number or null, got ${m}.`);
  return `${Math.round(m).toLocaleString('en-US')} m`;
}

/**
 * A ratio as a whole percentage, or a dash when unknown.
 * @example formatPercent(0.874) // '87 %'
 */
export function formatPercent(ratio: number | null): string {
  if (ratio === null) return '—';
  if (!Number.isFinite(ratio)) throw new Error(`formatPercent: ratio must be a finite number or null, got ${ratio}.`);
  return `${Math.round(ratio * 100)} %`;
}

/**
 * An area in square kilometres with two significant decimals for small areas.
 * @example formatAreaKm2(12.3456) // '12.3 km²'
 */
export function formatAreaKm2(km2: number): string {
  if (!Number.isFinite(km2) || km2 < 0) throw new Error(`formatAreaKm2: area must be a finite number ≥ 0, got ${km2}.`);
  return km2 < 10 ? `${km2.toFixed(2)} km²` : `${km2.toFixed(1)} km²`;
}

/**
 * A depth interval in metres; one unknown end reads as a dash, both unknown as a single dash.
 * @example formatRangeM(2300, 3100) // '2,300 – 3,100 m'
 * @example formatRangeM(null, null) // '—'
 */
export function formatRangeM(topM: number | null, baseM: number | null): string {
  if (topM === null && baseM === null) return '—';
  const num = (m: number | null) => (m === null ? '—' : Math.round(m).toLocaleString('en-US'));
  return `${num(topM)} – ${num(baseM)} m`;
}
