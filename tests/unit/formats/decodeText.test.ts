import { describe, expect, it } from 'vitest';
import { BINARY_FILE_MESSAGE, decodeText } from '@shared/formats/decodeText';
import { formatProblem, ProblemList } from '@shared/formats/problem';

describe('decodeText', () => {
  it('reads UTF-8 and drops its BOM', () => {
    const bytes = new Uint8Array([0xef, 0xbb, 0xbf, 0x53, 0xc3, 0xbc, 0x64]); // BOM + "Süd" (RFC 3629 encoding of U+00FC)
    expect(decodeText(bytes)).toEqual({ text: 'Süd', encoding: 'utf-8' });
  });

  it('falls back to windows-1252 when the bytes are not valid UTF-8', () => {
    // WHATWG Encoding Standard, index windows-1252: 0xFC → U+00FC ü, 0x80 → U+20AC €, 0xB0 → U+00B0 °.
    const bytes = new Uint8Array([0x53, 0xfc, 0x64, 0x20, 0x80, 0x20, 0xb0]);
    expect(decodeText(bytes)).toEqual({ text: 'Süd € °', encoding: 'windows-1252' });
  });

  it('maps the windows-1252 punctuation block 0x80–0x9F as browsers do, also under Node', () => {
    // WHATWG index-windows-1252: 0x93 “ 0x94 ” 0x96 – 0x97 — 0x99 ™ 0x9F Ÿ; 0x81 stays U+0081.
    const bytes = new Uint8Array([0x93, 0x41, 0x94, 0x96, 0x97, 0x99, 0x9f, 0x81]);
    expect(decodeText(bytes).text).toBe('\u201cA\u201d\u2013\u2014\u2122\u0178\u0081');
  });

  it('reads UTF-16 when a BOM says so', () => {
    const le = new Uint8Array([0xff, 0xfe, 0x4d, 0x00, 0x44, 0x00]); // "MD" in UTF-16LE (RFC 2781)
    expect(decodeText(le)).toEqual({ text: 'MD', encoding: 'utf-16le' });
  });

  it('refuses NUL bytes and control-character junk as binary', () => {
    expect(() => decodeText(new Uint8Array([0x7e, 0x56, 0x00, 0x01]))).toThrow(BINARY_FILE_MESSAGE);
    const junk = new Uint8Array(200).map((_, i) => (i % 4 === 0 ? 0x02 : 0x41)); // 25 % STX characters
    expect(() => decodeText(junk)).toThrow('File looks binary, not text');
  });

  it('accepts tabs, CR LF and a trailing DOS end-of-file mark as text', () => {
    const bytes = new TextEncoder().encode('a\tb\r\nc\x1a');
    expect(decodeText(bytes).text).toBe('a\tb\r\nc\x1a');
  });
});

describe('ProblemList', () => {
  it('lists the first problems and sums up the rest on one line', () => {
    const list = new ProblemList(2);
    list.add(3, 'one');
    list.add(4, 'two', 'GR');
    list.add(9, 'three');
    list.add(12, 'four');
    expect(list.finish()).toEqual([
      { line: 3, message: 'one' },
      { line: 4, column: 'GR', message: 'two' },
      { line: 9, message: '2 more problems from this line on are not listed' },
    ]);
    expect(list.count).toBe(4);
  });

  it('formats a problem the way users read it', () => {
    expect(formatProblem({ line: 12, column: 'md', message: "'abc' is not a number" })).toBe("line 12, column md: 'abc' is not a number");
    expect(formatProblem({ line: 57, message: 'expected 6 values, found 5' })).toBe('line 57: expected 6 values, found 5');
  });
});
