import { BINARY_FILE_MESSAGE, decodeText } from '../decodeText';
import { ProblemList } from '../problem';
import { detectDecimalComma } from './detectDecimalComma';
import { detectDelimiter } from './detectDelimiter';
import { readRecords } from './readRecords';
import type { CsvFile, CsvParseOptions, CsvRow } from './types';

/**
 * Reads a delimited text file whose first non-blank record is the header (RFC 4180). Own code rather
 * than a CSV package: every record must keep its exact physical line, also across quoted line breaks,
 * the same in the browser and on the server, with no extra dependency.
 * Detects the delimiter (comma, semicolon, tab, pipe) and decimal commas unless given; drops a UTF-8
 * BOM; skips blank lines; leaves ragged records out and reports them ("expected 9 fields, found 8").
 * Never throws.
 *
 * @example
 * const csv = parseCsv('md;pp\n1000,5;12,3\n');
 * // → { delimiter: ';', decimalComma: true, header: ['md', 'pp'], rows: [{ line: 2, cells: ['1000,5', '12,3'] }], raggedLines: [], problems: [] }
 */
export function parseCsv(input: string | Uint8Array, options: CsvParseOptions = {}): CsvFile {
  let text: string;
  try {
    text = typeof input === 'string' ? input : decodeText(input).text;
  } catch {
    return {
      delimiter: options.delimiter ?? ',',
      decimalComma: false,
      header: [],
      rows: [],
      raggedLines: [],
      problems: [{ line: 1, message: BINARY_FILE_MESSAGE }],
    };
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);

  const problems = new ProblemList();
  const delimiter = options.delimiter ?? detectDelimiter(text);
  const records = readRecords(text, delimiter, problems);
  if (records.length === 0) {
    problems.add(1, 'the file holds no header and no data');
    return { delimiter, decimalComma: false, header: [], rows: [], raggedLines: [], problems: problems.finish() };
  }

  const headerRecord = records[0];
  const header = nameColumns(headerRecord, problems);
  const rows: CsvRow[] = [];
  const raggedLines: number[] = [];
  for (let r = 1; r < records.length; r++) {
    const record = records[r];
    if (record.cells.length === header.length) rows.push(record);
    else {
      problems.add(record.line, `expected ${header.length} fields, found ${record.cells.length}`);
      raggedLines.push(record.line);
    }
  }
  const decimalComma = options.decimalComma ?? detectDecimalComma(rows, delimiter);
  return { delimiter, decimalComma, header, rows, raggedLines, problems: problems.finish() };
}

/** Trimmed names; empty ones get "column N" and repeats name:1, name:2 so that every column has a unique key. */
function nameColumns(record: CsvRow, problems: ProblemList): string[] {
  const names = record.cells.map((cell, k) => cell.trim() || `column ${k + 1}`);
  const positions = new Map<string, number[]>();
  names.forEach((name, k) => positions.set(name, [...(positions.get(name) ?? []), k]));
  for (const [name, at] of positions) {
    if (at.length < 2) continue;
    at.forEach((k, n) => (names[k] = `${name}:${n + 1}`));
    problems.add(record.line, `column name '${name}' appears ${at.length} times; renamed ${at.map((k) => names[k]).join(', ')}`);
  }
  return names;
}
