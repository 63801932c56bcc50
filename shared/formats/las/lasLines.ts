import type { ProblemList } from '../problem';

/** Longer lines are refused: no honest log line is this long, and a reader must not stall on one. */
export const MAX_LINE_LENGTH = 10_000;

/** A section as a range of the file's lines: `lines[start]` is 1-based line `start + 1`. */
export interface RawSection {
  /** Upper-case letter after the tilde: V, W, C, P, O, A, or another for a custom section. */
  letter: string;
  title: string;
  /** 1-based line of the `~` title. */
  line: number;
  start: number;
  end: number;
}

/**
 * Splits LF, CRLF or CR-only text into lines (a trailing CR is dropped from each line).
 *
 * @example
 * splitLines('a\r\nb\n'); // → ['a', 'b', '']
 */
export function splitLines(text: string): string[] {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.indexOf('\n') < 0) return body.split('\r');
  const lines = body.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const s = lines[i];
    if (s.length > 0 && s.charCodeAt(s.length - 1) === 13) lines[i] = s.slice(0, -1);
  }
  return lines;
}

/**
 * Index of the first non-space, non-tab character, or -1 for a blank line.
 *
 * @example
 * firstNonBlank('  ~A'); // → 2
 */
export function firstNonBlank(s: string): number {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c !== 32 && c !== 9) return i;
  }
  return -1;
}

/**
 * Finds the sections (a `~` as the first non-space character starts one, CWLS LAS 2.0 §5.1) and reports
 * over-long lines once, here, so that every later reader can simply skip them.
 *
 * @example
 * findSections(['~V', 'VERS. 2.0 :', '~A', '1 2'], errors, warnings).map((s) => s.letter); // → ['V', 'A']
 */
export function findSections(lines: string[], errors: ProblemList, warnings: ProblemList): RawSection[] {
  const sections: RawSection[] = [];
  let strayTextLine = 0;
  for (let i = 0; i < lines.length; i++) {
    const s = lines[i];
    if (s.length > MAX_LINE_LENGTH) {
      errors.add(i + 1, `line is ${s.length} characters long; the limit is ${MAX_LINE_LENGTH}`);
      continue;
    }
    const at = firstNonBlank(s);
    if (at < 0) continue;
    if (s.charCodeAt(at) === 126 /* ~ */) {
      if (sections.length > 0) sections[sections.length - 1].end = i;
      sections.push({ letter: s.charAt(at + 1).toUpperCase(), title: s.slice(at).trim(), line: i + 1, start: i + 1, end: lines.length });
    } else if (sections.length === 0 && s.charCodeAt(at) !== 35 /* # */ && strayTextLine === 0) {
      strayTextLine = i + 1;
    }
  }
  if (strayTextLine > 0) warnings.add(strayTextLine, 'text before the first section (~V) is ignored');
  return sections;
}
