import type { ImportKind } from '../schemas/imports';

/**
 * What each CSV import kind can read: the fields, which are required, the kind of value each holds,
 * and the header spellings we recognise. Units are chosen per column (suggested from the header).
 */
export type FieldType = 'text' | 'number' | 'date' | 'boolean';
/** The physical quantity of a numeric field, which decides the units offered for it. */
export type FieldQuantity = 'depth' | 'angle' | 'pressureOrDensity';

export interface ImportField {
  key: string;
  label: string;
  type: FieldType;
  required: boolean;
  quantity?: FieldQuantity;
  aliases: string[];
  /** Allowed values for enumerated text fields (matched case-insensitively, with synonyms). */
  values?: readonly string[];
}

export type CsvImportKind = Exclude<ImportKind, 'las'>;

const wellRef: ImportField = {
  key: 'well',
  label: 'Well (name or UWI)',
  type: 'text',
  required: true,
  aliases: ['well', 'well name', 'wellname', 'well_name', 'uwi', 'api', 'well id', 'borehole', 'hole'],
};
const md: ImportField = {
  key: 'md',
  label: 'Measured depth',
  type: 'number',
  required: true,
  quantity: 'depth',
  aliases: ['md', 'measured depth', 'depth', 'depth md', 'mdrt', 'mdkb'],
};
const tvd: ImportField = {
  key: 'tvd',
  label: 'True vertical depth',
  type: 'number',
  required: false,
  quantity: 'depth',
  aliases: ['tvd', 'true vertical depth', 'tvdrt', 'tvdkb', 'tvd rt'],
};

export const IMPORT_FIELDS: Record<CsvImportKind, ImportField[]> = {
  wells: [
    { key: 'name', label: 'Well name', type: 'text', required: true, aliases: ['name', 'well', 'well name', 'wellname', 'well_name'] },
    { key: 'uwi', label: 'UWI / API number', type: 'text', required: false, aliases: ['uwi', 'api', 'api number', 'uwi/api', 'well id'] },
    { key: 'operator', label: 'Operator', type: 'text', required: false, aliases: ['operator', 'company', 'operated by'] },
    {
      key: 'x',
      label: 'Longitude or easting',
      type: 'number',
      required: true,
      aliases: ['lon', 'longitude', 'long', 'x', 'easting', 'east', 'surface x', 'x coord'],
    },
    {
      key: 'y',
      label: 'Latitude or northing',
      type: 'number',
      required: true,
      aliases: ['lat', 'latitude', 'y', 'northing', 'north', 'surface y', 'y coord'],
    },
    { key: 'epsg', label: 'EPSG code of x/y', type: 'number', required: false, aliases: ['epsg', 'crs', 'srid', 'epsg code'] },
    {
      key: 'datumElevation',
      label: 'Rig datum elevation (RT/KB above sea level)',
      type: 'number',
      required: false,
      quantity: 'depth',
      aliases: ['rt', 'kb', 'rkb', 'datum', 'datum elevation', 'elevation', 'kb elevation', 'rt elevation', 'drill floor'],
    },
    {
      key: 'datumKind',
      label: 'Datum kind (RT, KB, DF)',
      type: 'text',
      required: false,
      aliases: ['datum kind', 'datum type', 'datum ref'],
      values: ['RT', 'KB', 'DF', 'GL', 'MSL'],
    },
    {
      key: 'groundElevation',
      label: 'Ground level elevation',
      type: 'number',
      required: false,
      quantity: 'depth',
      aliases: ['gl', 'ground level', 'ground elevation'],
    },
    {
      key: 'waterDepth',
      label: 'Water depth',
      type: 'number',
      required: false,
      quantity: 'depth',
      aliases: ['water depth', 'wd', 'waterdepth', 'water_depth'],
    },
    { key: 'airGap', label: 'Air gap', type: 'number', required: false, quantity: 'depth', aliases: ['air gap', 'airgap', 'air_gap'] },
    { key: 'spudDate', label: 'Spud date', type: 'date', required: false, aliases: ['spud', 'spud date', 'spud_date', 'spudded'] },
    {
      key: 'tdMd',
      label: 'Total depth (MD)',
      type: 'number',
      required: false,
      quantity: 'depth',
      aliases: ['td', 'td md', 'total depth', 'td_md', 'tdmd'],
    },
    {
      key: 'tdTvd',
      label: 'Total depth (TVD)',
      type: 'number',
      required: false,
      quantity: 'depth',
      aliases: ['td tvd', 'td_tvd', 'tdtvd'],
    },
    {
      key: 'status',
      label: 'Status',
      type: 'text',
      required: false,
      aliases: ['status', 'well status'],
      values: ['planned', 'drilling', 'drilled', 'abandoned', 'suspended'],
    },
    { key: 'offshore', label: 'Offshore (yes/no)', type: 'boolean', required: false, aliases: ['offshore', 'marine'] },
    { key: 'note', label: 'Note', type: 'text', required: false, aliases: ['note', 'notes', 'comment', 'remarks'] },
  ],
  surveys: [
    wellRef,
    md,
    {
      key: 'inc',
      label: 'Inclination',
      type: 'number',
      required: true,
      quantity: 'angle',
      aliases: ['inc', 'incl', 'inclination', 'dev', 'deviation'],
    },
    {
      key: 'azi',
      label: 'Azimuth',
      type: 'number',
      required: true,
      quantity: 'angle',
      aliases: ['azi', 'az', 'azim', 'azimuth', 'direction'],
    },
  ],
  pressures: [
    wellRef,
    {
      key: 'kind',
      label: 'Kind',
      type: 'text',
      required: true,
      aliases: ['kind', 'type', 'test type', 'event', 'observation'],
      values: ['formation_test', 'dst', 'kick', 'loss', 'mud_weight', 'lot', 'fit', 'pp_estimate', 'other'],
    },
    md,
    tvd,
    {
      key: 'value',
      label: 'Pressure or EMW',
      type: 'number',
      required: true,
      quantity: 'pressureOrDensity',
      aliases: ['value', 'pressure', 'emw', 'mud weight', 'mw', 'pore pressure', 'formation pressure'],
    },
    {
      key: 'valueUnit',
      label: 'Unit of the value (per row)',
      type: 'text',
      required: false,
      aliases: ['unit', 'units', 'value unit', 'uom'],
    },
    {
      key: 'quality',
      label: 'Quality',
      type: 'text',
      required: false,
      aliases: ['quality', 'qc', 'test quality', 'flag'],
      values: ['good', 'tight', 'supercharged', 'doubtful', 'unknown'],
    },
    { key: 'fluid', label: 'Fluid / phase', type: 'text', required: false, aliases: ['fluid', 'phase', 'fluid type'] },
    { key: 'date', label: 'Date', type: 'date', required: false, aliases: ['date', 'test date', 'observed'] },
    { key: 'source', label: 'Source note', type: 'text', required: false, aliases: ['source', 'reference', 'note', 'comment'] },
  ],
  tops: [
    wellRef,
    {
      key: 'name',
      label: 'Top name',
      type: 'text',
      required: true,
      aliases: ['top', 'name', 'formation', 'top name', 'horizon', 'marker'],
    },
    md,
    tvd,
    { key: 'lithology', label: 'Lithology', type: 'text', required: false, aliases: ['lithology', 'lith', 'rock'] },
  ],
};

/** Units offered for each quantity; the first is the default when the header does not say. */
export const UNITS_FOR_QUANTITY: Record<FieldQuantity, readonly string[]> = {
  depth: ['m', 'ft'],
  angle: ['deg'],
  pressureOrDensity: ['psi', 'kPa', 'MPa', 'bar', 'Pa', 'ppg', 'sg', 'g/cc', 'kg/m3', 'psi/ft', 'kPa/m'],
};
