/**
 * Turns the bytes of an uploaded text file into a string, the same way in the browser and on the server
 * (TextDecoder only, no Node Buffer).
 */
export type TextEncodingName = 'utf-8' | 'windows-1252' | 'utf-16le' | 'utf-16be';

export interface DecodedText {
  text: string;
  encoding: TextEncodingName;
}

export const BINARY_FILE_MESSAGE = 'File looks binary, not text';

/** Enough of the file to judge it; a log file's header alone is usually longer than this. */
const SAMPLE_LENGTH = 65_536;
/** More than this share of control characters means the file is not text. Common practice, no source. */
const MAX_CONTROL_SHARE = 0.05;

/**
 * Decodes UTF-8 (BOM dropped), falling back to windows-1252 (the superset of Latin-1 that browsers use
 * for the "latin1" label) when the bytes are not valid UTF-8; a UTF-16 BOM selects UTF-16.
 * Throws `Error('File looks binary, not text')` for NUL bytes or many control characters.
 *
 * @example
 * decodeText(new Uint8Array([0x4d, 0xfc, 0x6c, 0x6c])); // → { text: 'Müll', encoding: 'windows-1252' }
 */
export function decodeText(bytes: Uint8Array): DecodedText {
  const utf16 = utf16FromBom(bytes);
  if (utf16 !== null) {
    const text = new TextDecoder(utf16).decode(bytes);
    if (looksBinary(text)) throw new Error(BINARY_FILE_MESSAGE);
    return { text, encoding: utf16 };
  }
  if (bytesLookBinary(bytes)) throw new Error(BINARY_FILE_MESSAGE);
  try {
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'utf-8' };
  } catch {
    return { text: decodeWindows1252(bytes), encoding: 'windows-1252' };
  }
}

/**
 * Bytes 0x80–0x9F of windows-1252 (WHATWG Encoding Standard, index-windows-1252). Needed because Node 20's
 * TextDecoder('windows-1252') decodes them as Latin-1 C1 controls while browsers follow the standard;
 * server and browser previews must agree.
 */
const WINDOWS_1252_HIGH = [
  0x20ac, 0x0081, 0x201a, 0x0192, 0x201e, 0x2026, 0x2020, 0x2021, 0x02c6, 0x2030, 0x0160, 0x2039, 0x0152, 0x008d, 0x017d, 0x008f, 0x0090,
  0x2018, 0x2019, 0x201c, 0x201d, 0x2022, 0x2013, 0x2014, 0x02dc, 0x2122, 0x0161, 0x203a, 0x0153, 0x009d, 0x017e, 0x0178,
];

function decodeWindows1252(bytes: Uint8Array): string {
  return new TextDecoder('windows-1252')
    .decode(bytes)
    .replace(/[\u0080-\u009f]/g, (c) => String.fromCharCode(WINDOWS_1252_HIGH[c.charCodeAt(0) - 0x80]));
}

function utf16FromBom(bytes: Uint8Array): 'utf-16le' | 'utf-16be' | null {
  if (bytes.length < 2) return null;
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return 'utf-16le';
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return 'utf-16be';
  return null;
}

/** Tab, LF, FF, CR are text; 0x1A is the end-of-file mark old DOS tools append. */
function isControl(code: number): boolean {
  return (code < 0x20 && code !== 0x09 && code !== 0x0a && code !== 0x0c && code !== 0x0d && code !== 0x1a) || code === 0x7f;
}

function bytesLookBinary(bytes: Uint8Array): boolean {
  return sampleLooksBinary(Math.min(bytes.length, SAMPLE_LENGTH), (i) => bytes[i]);
}

function looksBinary(text: string): boolean {
  return sampleLooksBinary(Math.min(text.length, SAMPLE_LENGTH), (i) => text.charCodeAt(i));
}

function sampleLooksBinary(n: number, codeAt: (i: number) => number): boolean {
  let controls = 0;
  for (let i = 0; i < n; i++) {
    const c = codeAt(i);
    if (c === 0) return true;
    if (isControl(c)) controls++;
  }
  return n > 0 && controls / n > MAX_CONTROL_SHARE;
}
