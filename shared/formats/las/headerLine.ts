import type { HeaderItem } from './types';

export interface HeaderLineResult {
  item: HeaderItem;
  /** Set when the line breaks the delimiter rule; `item` then holds a best-effort reading. */
  problem?: string;
}

/**
 * Splits a ~V/~W/~C/~P line at the standard's three delimiters: the first dot, the first space after it,
 * and the last colon (CWLS LAS 2.0, 2014 update, §5.2). Units may be empty (`DEPT.  : depth`).
 *
 * @example
 * parseHeaderLine('RHOB .K/M3   45 350 02 00 : 2 BULK DENSITY', 30).item;
 * // → { mnemonic: 'RHOB', unit: 'K/M3', value: '45 350 02 00', description: '2 BULK DENSITY', line: 30 }
 */
export function parseHeaderLine(text: string, line: number): HeaderLineResult {
  let lastColon = text.lastIndexOf(':');
  const dot = text.indexOf('.');
  const colonMissing = lastColon < 0 || lastColon < dot;
  if (colonMissing) lastColon = text.length;

  if (dot < 0 || dot > lastColon) {
    const before = text.slice(0, lastColon).trim();
    const gap = before.search(/\s/);
    const mnemonic = gap < 0 ? before : before.slice(0, gap);
    const value = gap < 0 ? '' : before.slice(gap).trim();
    return {
      item: { mnemonic, unit: '', value, description: text.slice(lastColon + 1).trim(), line },
      problem: 'no dot after the mnemonic (expected MNEM.UNIT VALUE : DESCRIPTION)',
    };
  }

  let unitEnd = dot + 1;
  while (unitEnd < lastColon && text[unitEnd] !== ' ' && text[unitEnd] !== '\t') unitEnd++;
  const item: HeaderItem = {
    mnemonic: text.slice(0, dot).trim(),
    unit: text.slice(dot + 1, unitEnd),
    value: text.slice(unitEnd, lastColon).trim(),
    description: colonMissing ? '' : text.slice(lastColon + 1).trim(),
    line,
  };
  if (item.mnemonic === '') return { item, problem: 'no mnemonic before the dot' };
  if (colonMissing) return { item, problem: 'no colon before the description (expected MNEM.UNIT VALUE : DESCRIPTION)' };
  return { item };
}
