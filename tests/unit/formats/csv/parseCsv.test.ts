import fc from 'fast-check';
import { dsvFormat } from 'd3';
import { describe, expect, it } from 'vitest';
import { decodeText } from '@shared/formats/decodeText';
import { detectDelimiter, parseCsv, parseNumber } from '@shared/formats/csv';
import { fixtureBytes, fixtureText } from '../fixtures';

// Record rules: RFC 4180 §2 (CRLF records, optional header, fields in double quotes may hold commas,
// line breaks and "" for a quote). d3-dsv, a general-purpose RFC 4180 parser, is the independent
// reference for cell contents; line numbers were counted in the fixture files (grep -n).
const d3Rows = (text: string, delimiter: string) => dsvFormat(delimiter).parseRows(text.replace(/^\uFEFF/, ''));

describe('parseCsv', () => {
  it('reads a comma file: header, cells as d3-dsv reads them, the line of every row', () => {
    const text = fixtureText('csv', 'good.csv');
    const csv = parseCsv(text);
    expect(csv.delimiter).toBe(',');
    expect(csv.decimalComma).toBe(false);
    expect(csv.problems).toEqual([]);
    expect(csv.header).toEqual(['well', 'md_m', 'tvd_m', 'pressure_psi', 'emw_ppg', 'source', 'date', 'comment', 'quality']);
    expect(csv.rows.map((r) => r.line)).toEqual([2, 3, 4, 5, 6, 7]);
    expect(csv.rows.map((r) => r.cells)).toEqual(d3Rows(text, ',').slice(1));
    expect(parseNumber(csv.rows[3].cells[3], csv)).toBe(3712.4);
    expect(csv.rows[2].cells[7]).toBe('');
  });

  it('detects semicolons with decimal commas', () => {
    const csv = parseCsv(fixtureText('csv', 'semicolon-decimal-comma.csv'));
    expect(csv.delimiter).toBe(';');
    expect(csv.decimalComma).toBe(true);
    expect(csv.header).toEqual(['Bohrung', 'MD (m)', 'TVD (m)', 'Druck [bar]', 'EMW ppg', 'Quelle']);
    expect(csv.rows[1]).toEqual({ line: 3, cells: ['KESTREL-3', '1750,5', '1746,9', '177,28', '8,64', 'RFT'] });
    expect(csv.rows[1].cells.slice(1, 5).map((c) => parseNumber(c, csv))).toEqual([1750.5, 1746.9, 177.28, 8.64]);
  });

  it('keeps quoted delimiters, "" and line breaks, and gives each record the line where it starts', () => {
    const text = fixtureText('csv', 'quoted-newlines.csv');
    const csv = parseCsv(text);
    expect(csv.problems).toEqual([]);
    expect(csv.rows.map((r) => r.line)).toEqual([2, 3, 6, 7, 8, 10]);
    expect(csv.rows.map((r) => r.cells)).toEqual(d3Rows(text, ',').slice(1));
    expect(csv.rows[0].cells[2]).toBe('normal, as expected');
    expect(csv.rows[1].cells[2]).toBe('first line\r\nsecond line\r\nthird line');
    expect(csv.rows[2].cells[2]).toBe('the "tight" spot');
    expect(csv.rows[3].cells).toEqual(['KESTREL-3', '2250.0', '']);
    expect(csv.rows[4].cells[2]).toBe('ends with a break\r\n');
  });

  it('skips blank lines and reports ragged rows with their line, leaving them out', () => {
    const csv = parseCsv(fixtureText('csv', 'ragged.csv'));
    expect(csv.problems).toEqual([
      { line: 14, message: 'expected 9 fields, found 8' },
      { line: 16, message: 'expected 9 fields, found 10' },
    ]);
    // Lines 5 (empty), 8 (spaces) and 11 (delimiters only) are blank.
    expect(csv.rows.map((r) => r.line)).toEqual([2, 3, 4, 6, 7, 9, 10, 12, 13, 15]);
    expect(csv.raggedLines).toEqual([14, 16]);
  });

  it('drops a UTF-8 BOM, from bytes and from text', () => {
    const fromBytes = parseCsv(fixtureBytes('csv', 'bom.csv'));
    expect(fromBytes.delimiter).toBe('\t');
    expect(fromBytes.header).toEqual(['md_ft', 'pressure_psi', 'temperature_degF']);
    const fromText = parseCsv(fixtureText('csv', 'bom.csv'));
    expect(fixtureText('csv', 'bom.csv').charCodeAt(0)).toBe(0xfeff);
    expect(fromText.header[0]).toBe('md_ft');
    expect(fromText.rows).toEqual(fromBytes.rows);
  });

  it('decodes Latin-1 (windows-1252) bytes', () => {
    const bytes = fixtureBytes('csv', 'latin1.csv');
    expect(decodeText(bytes).encoding).toBe('windows-1252');
    const csv = parseCsv(bytes);
    expect(csv.header).toEqual(['Bohrung', 'Tiefe_m', 'Temperatur (°C)', 'Bemerkung']);
    expect(csv.rows[0].cells).toEqual(['KESTREL-3 Süd', '1500,0', '61,5', 'Messung bestätigt']);
    expect(csv.rows[1].cells[3]).toBe('Spülung gewechselt');
    expect(csv.decimalComma).toBe(true);
  });

  it('reports an unclosed quote, text after a closing quote and an empty file', () => {
    expect(parseCsv('a,b\n1,"open\n2,3\n').problems).toEqual([
      { line: 2, message: 'a quoted field that starts on this line is never closed' },
    ]);
    const stray = parseCsv('a,b\n"x"y,2\n');
    expect(stray.problems).toEqual([{ line: 2, message: 'text after a closing quote; it is kept as part of the field' }]);
    expect(stray.rows[0].cells).toEqual(['xy', '2']);
    expect(parseCsv('\n  \n').problems).toEqual([{ line: 1, message: 'the file holds no header and no data' }]);
    expect(parseCsv(new Uint8Array([1, 0, 2])).problems).toEqual([{ line: 1, message: 'File looks binary, not text' }]);
  });

  it('names empty and repeated header cells so that every column has a key', () => {
    const csv = parseCsv('md,,md\n1,2,3\n');
    expect(csv.header).toEqual(['md:1', 'column 2', 'md:2']);
    expect(csv.problems).toEqual([{ line: 1, message: "column name 'md' appears 2 times; renamed md:1, md:2" }]);
  });

  it('honours a given delimiter and decimal setting', () => {
    const csv = parseCsv('a;b\n1,5;2\n', { delimiter: ',', decimalComma: false });
    expect(csv.header).toEqual(['a;b']);
    expect(csv.problems).toEqual([{ line: 2, message: 'expected 1 fields, found 2' }]);
  });

  it('matches d3-dsv on any table written by d3-dsv (property test), with exact start lines', () => {
    const cell = fc.oneof(fc.string(), fc.constantFrom('a,b', 'x"y', '"q"', 'l1\nl2', 'r\r\nn', ' ', '1,5'));
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 5 }),
        fc.array(fc.array(cell, { minLength: 5, maxLength: 5 }), { minLength: 1, maxLength: 8 }),
        (width, table) => {
          const rows = table.map((r) => r.slice(0, width));
          const header = Array.from({ length: width }, (_, k) => `h${k}`);
          const text = dsvFormat(',').formatRows([header, ...rows]);
          const csv = parseCsv(text, { delimiter: ',' });
          const nonBlank = rows.filter((r) => r.some((c) => c.trim() !== ''));
          expect(csv.rows.map((r) => r.cells)).toEqual(nonBlank);
          // Each record starts one line after the previous record's last line break.
          const formatted = rows.map((r) => dsvFormat(',').formatRows([r]));
          let line = 2;
          const starts = formatted.map((f) => {
            const start = line;
            line += (f.match(/\n/g)?.length ?? 0) + 1;
            return start;
          });
          expect(csv.rows.map((r) => r.line)).toEqual(starts.filter((_, i) => rows[i].some((c) => c.trim() !== '')));
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('detectDelimiter', () => {
  it.each([
    ['a,b,c\n1,2,3\n', ','],
    ['a;b;c\n1,5;2,5;3\n', ';'],
    ['a\tb\n1,5\t2\n', '\t'],
    ['a|b|c\n1|2|3\n', '|'],
    ['"x;y",b\n"1;2",3\n', ','],
    ['single\n1\n', ','],
  ])('%j → %j', (text, delimiter) => {
    expect(detectDelimiter(text)).toBe(delimiter);
  });
});
