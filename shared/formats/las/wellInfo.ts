import type { ProblemList } from '../problem';
import { findItem } from './headerSections';
import type { RawSection } from './lasLines';
import type { HeaderItem, LasWellInfo } from './types';

/** The conventional null marker (CWLS LAS 2.0, §5.4), used when ~W gives none. */
export const DEFAULT_LAS_NULL = -999.25;

const TEXT_FIELDS = ['COMP', 'WELL', 'FLD', 'LOC', 'SRVC', 'DATE', 'UWI', 'API', 'PROV', 'CNTY', 'STAT', 'CTRY'] as const;
/** LAS 1.2 put ~W texts after the colon with a label before it ("COMP.  COMPANY: ACME"); these labels give that away. */
const LAS12_LABELS = new Set([
  'COMPANY',
  'WELL',
  'FIELD',
  'LOCATION',
  'PROVINCE',
  'COUNTY',
  'STATE',
  'COUNTRY',
  'SERVICE COMPANY',
  'DATE',
  'LOG DATE',
  'UNIQUE WELL ID',
  'UWI',
  'API',
  'API NUMBER',
]);

/**
 * Picks the standard's ~W items out of the section (CWLS LAS 2.0, §5.4), warning about missing ones.
 *
 * @example
 * readWellInfo(items, section, false, warnings).NULL; // → -999.25
 */
export function readWellInfo(items: HeaderItem[], section: RawSection | undefined, isV12: boolean, warnings: ProblemList): LasWellInfo {
  const numberOf = (mnemonic: string, required: boolean): number | null => {
    const item = findItem(items, mnemonic);
    if (!item) {
      if (required && section) warnings.add(section.line, `${mnemonic} is missing from ~W`);
      return null;
    }
    const value = Number(item.value);
    if (item.value === '' || Number.isNaN(value)) {
      warnings.add(item.line, `${mnemonic} value '${item.value}' is not a number`);
      return null;
    }
    return value;
  };

  let nullValue = numberOf('NULL', false);
  if (nullValue === null) {
    if (section && !findItem(items, 'NULL')) warnings.add(section.line, `NULL is missing from ~W; ${DEFAULT_LAS_NULL} assumed`);
    nullValue = DEFAULT_LAS_NULL;
  }
  const well = emptyWellInfo();
  well.STRT = numberOf('STRT', true);
  well.STOP = numberOf('STOP', true);
  well.STEP = numberOf('STEP', true);
  well.NULL = nullValue;
  well.items = items;
  for (const field of TEXT_FIELDS) {
    const item = findItem(items, field);
    if (!item) continue;
    const labelled = isV12 && (item.value === '' || LAS12_LABELS.has(item.value.toUpperCase()));
    well[field] = labelled ? item.description : item.value;
  }

  if (section) {
    const missing = ['COMP', 'WELL', 'FLD', 'LOC', 'SRVC', 'DATE'].filter((m) => !findItem(items, m));
    if (!findItem(items, 'UWI') && !findItem(items, 'API')) missing.push('UWI or API');
    if (!findItem(items, 'PROV') && !(findItem(items, 'CNTY') && findItem(items, 'STAT') && findItem(items, 'CTRY'))) {
      missing.push('PROV or CNTY/STAT/CTRY');
    }
    if (missing.length > 0) warnings.add(section.line, `~W lacks ${missing.join(', ')} (required by LAS 2.0)`);
  }
  return well;
}

/**
 * A ~W with nothing in it but the default NULL.
 *
 * @example
 * emptyWellInfo().STRT; // → null
 */
export function emptyWellInfo(): LasWellInfo {
  return {
    STRT: null,
    STOP: null,
    STEP: null,
    NULL: DEFAULT_LAS_NULL,
    COMP: '',
    WELL: '',
    FLD: '',
    LOC: '',
    SRVC: '',
    DATE: '',
    UWI: '',
    API: '',
    PROV: '',
    CNTY: '',
    STAT: '',
    CTRY: '',
    items: [],
  };
}
