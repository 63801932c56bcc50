import type { Problem } from '../problem';

export type CsvDelimiter = ',' | ';' | '\t' | '|';

export interface CsvRow {
  /** 1-based physical line where the record starts (a quoted field may carry it over several lines). */
  line: number;
  /** As written, quotes removed and "" turned into ", spaces kept (RFC 4180 §2.4). */
  cells: string[];
}

export interface CsvParseOptions {
  /** Skip detection. */
  delimiter?: CsvDelimiter;
  /** Skip detection. */
  decimalComma?: boolean;
}

export interface CsvFile {
  delimiter: CsvDelimiter;
  decimalComma: boolean;
  /** Trimmed names; an empty name becomes "column N", repeats become name:1, name:2. */
  header: string[];
  /** Data records with as many cells as the header; ragged records are left out and reported. */
  rows: CsvRow[];
  /** Lines of the ragged records left out of `rows`, so that they count as skipped records. */
  raggedLines: number[];
  problems: Problem[];
}
