import type { CsvImportKind } from '@shared/imports/fields';
import { PRESSURE_KIND_LABELS, type PressureKind, type PressureQuality } from '@shared/schemas/wells';
import { PRESSURE_QUALITY_LABELS } from '@/components/well/wellLabels';
import type { PreviewRow } from '@shared/schemas/imports';
import type { UnitPreferences } from '@/stores/units';
import { doglegIn, doglegUnit, formatDepth, formatEmw, formatNumber, formatPressure, MISSING, unitLabel } from '@/utils/quantities';

/** How a preview value (SI, as the server normalised it) is shown. */
type Show = 'text' | 'quality' | 'depth' | 'degrees' | 'lonLat' | 'pressure' | 'emw' | 'entered' | 'dogleg' | 'number' | 'pressureKind';

export interface PreviewColumnSpec {
  key: string;
  /** Title without its unit; the unit is added for the reader's choice. */
  title: string;
  show: Show;
  width?: number;
}

/** The normalised fields worth checking before committing, per kind (keys as the server's preview rows name them). */
export const PREVIEW_COLUMNS: Record<CsvImportKind, PreviewColumnSpec[]> = {
  wells: [
    { key: 'name', title: 'Well', show: 'text', width: 125 },
    { key: 'uwi', title: 'UWI', show: 'text', width: 120 },
    { key: 'operator', title: 'Operator', show: 'text', width: 130 },
    { key: 'lon', title: 'Longitude', show: 'lonLat', width: 100 },
    { key: 'lat', title: 'Latitude', show: 'lonLat', width: 100 },
    { key: 'datumElevationM', title: 'Datum elev.', show: 'depth', width: 110 },
    { key: 'waterDepthM', title: 'Water depth', show: 'depth', width: 110 },
    { key: 'tdMdM', title: 'TD MD', show: 'depth', width: 100 },
    { key: 'tdTvdM', title: 'TD TVD', show: 'depth', width: 100 },
    { key: 'spudDate', title: 'Spud date', show: 'text', width: 112 },
    { key: 'status', title: 'Status', show: 'text', width: 95 },
  ],
  surveys: [
    { key: 'well', title: 'Well', show: 'text', width: 140 },
    { key: 'mdM', title: 'MD', show: 'depth', width: 100 },
    { key: 'incDeg', title: 'Inc', show: 'degrees', width: 80 },
    { key: 'aziDeg', title: 'Azi', show: 'degrees', width: 80 },
    { key: 'tvdM', title: 'TVD', show: 'depth', width: 100 },
    { key: 'northM', title: 'North', show: 'depth', width: 100 },
    { key: 'eastM', title: 'East', show: 'depth', width: 100 },
    { key: 'doglegDegPer30m', title: 'DLS', show: 'dogleg', width: 110 },
  ],
  pressures: [
    { key: 'wellName', title: 'Well', show: 'text', width: 130 },
    { key: 'kind', title: 'Kind', show: 'pressureKind', width: 195 },
    { key: 'mdM', title: 'MD', show: 'depth', width: 95 },
    { key: 'tvdM', title: 'TVD', show: 'depth', width: 95 },
    { key: 'valueEntered', title: 'As entered', show: 'entered', width: 110 },
    { key: 'pressurePa', title: 'Pressure', show: 'pressure', width: 110 },
    { key: 'emwKgM3', title: 'EMW', show: 'emw', width: 90 },
    { key: 'quality', title: 'Quality', show: 'quality', width: 105 },
  ],
  tops: [
    { key: 'wellName', title: 'Well', show: 'text', width: 140 },
    { key: 'name', title: 'Top', show: 'text', width: 160 },
    { key: 'mdM', title: 'MD', show: 'depth', width: 100 },
    { key: 'tvdM', title: 'TVD', show: 'depth', width: 100 },
    { key: 'lithology', title: 'Lithology', show: 'text', width: 200 },
  ],
};

/**
 * A column title with the unit it is shown in.
 * @example previewTitle({ key: 'mdM', title: 'MD', show: 'depth' }, { depth: 'ft', pressure: 'psi', emw: 'ppg' }) // 'MD (ft)'
 */
export function previewTitle(spec: PreviewColumnSpec, units: UnitPreferences): string {
  switch (spec.show) {
    case 'depth':
      return `${spec.title} (${units.depth})`;
    case 'degrees':
    case 'lonLat':
      return `${spec.title} (°)`;
    case 'pressure':
      return `${spec.title} (${units.pressure})`;
    case 'emw':
      return `${spec.title} (${units.emw})`;
    case 'dogleg':
      return `${spec.title} (${doglegUnit(units.depth)})`;
    default:
      return spec.title;
  }
}

const asNumber = (v: unknown) => (typeof v === 'number' ? v : null);

/**
 * One preview value as text in the reader's units.
 * @example previewCell({ key: 'waterDepthM', title: 'Water depth', show: 'depth' }, { waterDepthM: 91.44 }, { depth: 'ft', pressure: 'MPa', emw: 'sg' }) // '300'
 */
export function previewCell(spec: PreviewColumnSpec, row: PreviewRow, units: UnitPreferences): string {
  const value = row[spec.key];
  switch (spec.show) {
    case 'depth':
      return formatDepth(asNumber(value), units.depth, 2);
    case 'degrees':
      return formatNumber(asNumber(value), 2);
    case 'lonLat':
      return formatNumber(asNumber(value), 6);
    case 'pressure':
      return formatPressure(asNumber(value), units.pressure);
    case 'emw':
      return formatEmw(asNumber(value), units.emw);
    case 'dogleg': {
      const n = asNumber(value);
      return n === null ? MISSING : formatNumber(doglegIn(n, units.depth), 2);
    }
    case 'entered':
      return `${formatNumber(asNumber(value), 3)} ${unitLabel(String(row.unitEntered ?? ''))}`.trim();
    case 'quality':
      return PRESSURE_QUALITY_LABELS[value as PressureQuality] ?? String(value ?? MISSING);
    case 'pressureKind':
      return PRESSURE_KIND_LABELS[value as PressureKind] ?? String(value ?? MISSING);
    case 'number':
      return formatNumber(asNumber(value), 3);
    default:
      return value === null || value === undefined || value === '' ? MISSING : String(value);
  }
}

/**
 * The columns some previewed row fills: a file without a TD column should not show an empty TD column.
 * With no valid rows at all, every column stays so the table still says what would be read.
 * @example columnsWithValues(PREVIEW_COLUMNS.tops, [{ wellName: 'A', name: 'Top X', mdM: 1, tvdM: 1, lithology: null }]).length // 4
 */
export function columnsWithValues(specs: readonly PreviewColumnSpec[], rows: readonly PreviewRow[]): PreviewColumnSpec[] {
  if (rows.length === 0) return [...specs];
  return specs.filter((s) => rows.some((r) => r[s.key] !== null && r[s.key] !== undefined && r[s.key] !== ''));
}
