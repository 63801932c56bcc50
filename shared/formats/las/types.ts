import type { Problem } from '../problem';

/** One `MNEM.UNIT  DATA : DESCRIPTION` line of ~V, ~W, ~C or ~P (CWLS LAS 2.0, §5.2). */
export interface HeaderItem {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
  /** 1-based line in the file. */
  line: number;
}

export type DepthUnit = 'm' | 'ft';

/** The ~W section: the standard's required items picked out, every line kept in `items`. */
export interface LasWellInfo {
  /** STRT, STOP, STEP as written (file order and file depth unit); null when missing or not a number. */
  STRT: number | null;
  STOP: number | null;
  STEP: number | null;
  /** The null marker; −999.25 when ~W gives none. */
  NULL: number;
  COMP: string;
  WELL: string;
  FLD: string;
  LOC: string;
  SRVC: string;
  DATE: string;
  UWI: string;
  API: string;
  PROV: string;
  CNTY: string;
  STAT: string;
  CTRY: string;
  items: HeaderItem[];
}

export interface LasCurve {
  /** Unique within the file: duplicates become MNEM:1, MNEM:2 (a warning says so). */
  mnemonic: string;
  unit: string;
  /** The DATA field of the ~C line, e.g. "45 350 02 00"; empty when none. */
  apiCode: string;
  description: string;
  /** In index order (ascending depth); NULL values are NaN. */
  values: Float64Array;
}

export interface LasIndex {
  mnemonic: string;
  /** Normalised depth unit; null when the file's index unit is not a depth unit (an error says so). */
  unit: DepthUnit | null;
  /** The unit as written in ~C (or in STRT when ~C gives none). */
  rawUnit: string;
  apiCode: string;
  description: string;
  /** Ascending, in `unit`. */
  values: Float64Array;
  /** Ascending, in metres; all NaN when the unit is unknown. */
  valuesM: Float64Array;
}

export interface LasFile {
  /** VERS as a number (2, 1.2, 3); null when missing or unreadable. */
  version: number | null;
  wrap: 'YES' | 'NO';
  well: LasWellInfo;
  /** The curves after the index (the first ~C curve is `index`, not repeated here). */
  curves: LasCurve[];
  index: LasIndex;
  parameters: HeaderItem[];
  /** The ~O section's text, lines joined with "\n". */
  other: string;
  /** Facts a user should know that are not problems, e.g. that descending depths were reordered. */
  notes: Problem[];
  warnings: Problem[];
  /** Non-empty means the file must not be imported; everything readable is still returned. */
  errors: Problem[];
}
