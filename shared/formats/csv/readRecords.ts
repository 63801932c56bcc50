import type { ProblemList } from '../problem';
import type { CsvDelimiter, CsvRow } from './types';

/**
 * Splits CSV text into records (RFC 4180, §2): LF or CRLF, fields in double quotes may hold delimiters,
 * line breaks and "" for a quote. Blank records (nothing but spaces and delimiters) are skipped. Each
 * record keeps the physical line where it starts. Lines without a quote take a fast path through
 * String.split, which is what makes 200,000 rows read in a fraction of a second.
 *
 * @example
 * readRecords('a,b\n"x\ny",2\n', ',', problems); // → [{ line: 1, cells: ['a', 'b'] }, { line: 2, cells: ['x\ny', '2'] }]
 */
export function readRecords(text: string, delimiter: CsvDelimiter, problems: ProblemList): CsvRow[] {
  const records: CsvRow[] = [];
  const length = text.length;
  let pos = 0;
  let line = 1;
  let nextQuote = text.indexOf('"');
  while (pos < length) {
    const newline = text.indexOf('\n', pos);
    const end = newline < 0 ? length : newline;
    if (nextQuote >= 0 && nextQuote < pos) nextQuote = text.indexOf('"', pos);
    if (nextQuote < 0 || nextQuote >= end) {
      const lineEnd = end > pos && text.charCodeAt(end - 1) === 13 ? end - 1 : end;
      const cells = text.slice(pos, lineEnd).split(delimiter);
      if (!isBlank(cells)) records.push({ line, cells });
      line++;
      pos = end + 1;
      continue;
    }
    const quoted = readQuotedRecord(text, pos, delimiter, line, problems);
    if (!isBlank(quoted.cells)) records.push({ line, cells: quoted.cells });
    line = quoted.nextLine;
    pos = quoted.nextPos;
  }
  return records;
}

function isBlank(cells: string[]): boolean {
  for (const c of cells) if (c.trim() !== '') return false;
  return true;
}

/** The character-by-character reader for a record that holds a quote somewhere. */
function readQuotedRecord(
  text: string,
  start: number,
  delimiter: CsvDelimiter,
  startLine: number,
  problems: ProblemList,
): { cells: string[]; nextPos: number; nextLine: number } {
  const cells: string[] = [];
  const length = text.length;
  let line = startLine;
  let pos = start;
  let strayTextReported = false;
  for (;;) {
    // One field per turn.
    let field = '';
    if (text[pos] === '"') {
      pos++;
      let closed = false;
      while (pos < length) {
        const q = text.indexOf('"', pos);
        const chunkEnd = q < 0 ? length : q;
        for (let i = text.indexOf('\n', pos); i >= 0 && i < chunkEnd; i = text.indexOf('\n', i + 1)) line++;
        field += text.slice(pos, chunkEnd);
        if (q < 0) {
          pos = length;
          break;
        }
        if (text[q + 1] === '"') {
          field += '"';
          pos = q + 2;
          continue;
        }
        pos = q + 1;
        closed = true;
        break;
      }
      if (!closed) problems.add(startLine, 'a quoted field that starts on this line is never closed');
      // RFC 4180 wants a delimiter or the line end right after the closing quote; keep any stray text.
      while (pos < length && text[pos] !== delimiter && text[pos] !== '\n' && text[pos] !== '\r') {
        if (!strayTextReported) {
          problems.add(line, 'text after a closing quote; it is kept as part of the field');
          strayTextReported = true;
        }
        field += text[pos];
        pos++;
      }
    } else {
      const d = text.indexOf(delimiter, pos);
      const nl = text.indexOf('\n', pos);
      const i = Math.min(d < 0 ? length : d, nl < 0 ? length : nl);
      field = text.slice(pos, i);
      if (i < length && text[i] === '\n' && field.endsWith('\r')) field = field.slice(0, -1);
      pos = i;
    }
    cells.push(field);

    if (pos >= length) return { cells, nextPos: length, nextLine: line + 1 };
    const ch = text[pos];
    if (ch === delimiter) {
      pos++;
      if (pos >= length) {
        cells.push('');
        return { cells, nextPos: length, nextLine: line + 1 };
      }
      continue;
    }
    // End of record: CRLF or LF (a lone CR after a closing quote is taken as a line end too).
    if (ch === '\r') pos++;
    if (text[pos] === '\n') pos++;
    return { cells, nextPos: pos, nextLine: line + 1 };
  }
}
