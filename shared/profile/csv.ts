import { G } from '../units/constants';
import { convert } from '../units/convert';
import type { DepthUnit, GradientUnit, PressureUnit } from '../units/unitTable';
import type { Profile } from './buildProfile';

/** The caution every exported view carries, word for word as on the screen. */
export const PROFILE_CAUTION =
  'Predictions guide, they do not decide: verify with the responsible licensed engineer and local regulations.';

/** What exports of the demo team's invented basin say, so a file passed on is never taken for a real well. */
export const SYNTHETIC_DATA_NOTE = 'Synthetic demo data';

/** The unit of the normal-trend values by the log the trend is on. */
const TREND_UNIT = { sonic: 'µs/ft', resistivity: 'ohm·m' } as const;

export interface ProfileCsvOptions {
  wellName: string;
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
  emwUnit: GradientUnit;
  /** Extra `# key: value` lines, e.g. the interpretation version. */
  meta?: Record<string, string>;
  /** The data is the demo basin's: says so on the second line. */
  synthetic?: boolean;
}

const fmt = (v: number, digits: number) => (Number.isFinite(v) ? v.toFixed(digits) : '');

/** RFC 4180: quote a field holding a comma, quote or line break, doubling inner quotes. */
function field(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/**
 * The computed curves of a profile as CSV (RFC 4180, CRLF line ends), one row per sample, in the reader's units,
 * with `#` lines on top: the caution, "synthetic" for demo data, the well, the units and any extra facts. EMW is
 * taken from the rig datum.
 * @example
 * profileCsv(profile, { wellName: 'AVX-08', depthUnit: 'm', pressureUnit: 'MPa', emwUnit: 'sg' }).split('\r\n')[0];
 * // '# Predictions guide, they do not decide: …'
 */
export function profileCsv(profile: Profile, options: ProfileCsvOptions): string {
  const { depthUnit: du, pressureUnit: pu, emwUnit: eu } = options;
  const lines: string[] = [`# ${PROFILE_CAUTION}`];
  if (options.synthetic) lines.push(`# ${SYNTHETIC_DATA_NOTE}: an invented basin, not a real well.`);
  lines.push(`# Well: ${options.wellName}`);
  for (const [k, v] of Object.entries(options.meta ?? {})) lines.push(`# ${k}: ${v}`);
  lines.push(`# Depths from the rig datum unless stated; EMW = pressure / (g × TVD below the rig datum), g = ${G} m/s²`);
  const curves: [string, Float64Array | null][] = [
    ['Hydrostatic', profile.hydrostaticPa],
    ['Overburden', profile.overburdenPa],
    ['Pore pressure', profile.porePa],
    ['Fracture pressure', profile.fracturePa],
  ];
  const present = curves.filter((c): c is [string, Float64Array] => c[1] !== null);
  const header = [
    `MD (${du})`,
    `TVD (${du})`,
    `TVDSS (${du})`,
    `Below mudline (${du})`,
    ...present.map(([name]) => `${name} (${pu})`),
    ...present.map(([name]) => `${name} EMW (${eu})`),
    'Density (kg/m3)',
    'Density source',
  ];
  if (profile.normalTrend)
    header.push(profile.normalTrendCurve ? `Normal trend (${TREND_UNIT[profile.normalTrendCurve]})` : 'Normal trend');
  lines.push(header.map(field).join(','));
  const dDigits = 2;
  const pDigits = pu === 'Pa' || pu === 'kPa' || pu === 'psi' ? 1 : 4;
  const eDigits = eu === 'Pa/m' ? 1 : 4;
  const depth = (m: number) => fmt(convert(m, 'm', du), dDigits);
  for (let i = 0; i < profile.tvdM.length; i++) {
    const z = profile.tvdM[i];
    const row = [
      depth(profile.mdM[i]),
      depth(z),
      depth(z - profile.seaLevelTvdM),
      depth(z - profile.mudlineTvdM),
      ...present.map(([, c]) => fmt(convert(c[i], 'Pa', pu), pDigits)),
      ...present.map(([, c]) => (z > 0 ? fmt(convert(c[i] / z, 'Pa/m', eu), eDigits) : '')),
      fmt(profile.densityKgM3[i], 1),
      Number.isNaN(profile.densityKgM3[i]) ? '' : profile.densityFromLog[i] ? 'log' : 'compaction trend',
    ];
    if (profile.normalTrend) row.push(fmt(profile.normalTrend[i], 4));
    lines.push(row.join(','));
  }
  return lines.join('\r\n') + '\r\n';
}
