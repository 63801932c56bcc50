/** Delimited text (RFC 4180) for imports: records with their physical lines, numbers, column mapping. */
export { parseCsv } from './parseCsv';
export { parseNumber, type NumberFormat } from './parseNumber';
export { detectDelimiter } from './detectDelimiter';
export { detectDecimalComma } from './detectDecimalComma';
export { splitHeaderUnit, type HeaderName } from './headerUnit';
export { suggestMapping, suggestColumnMatches, type MappableField, type ColumnMatch } from './suggestMapping';
export type { CsvFile, CsvRow, CsvDelimiter, CsvParseOptions } from './types';
