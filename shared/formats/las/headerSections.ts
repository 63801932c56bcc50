import type { ProblemList } from '../problem';
import { parseHeaderLine } from './headerLine';
import { type RawSection, firstNonBlank, MAX_LINE_LENGTH } from './lasLines';
import type { HeaderItem } from './types';

/**
 * Reads the `MNEM.UNIT VALUE : DESCRIPTION` lines of one section, skipping comments and blank lines;
 * a line that breaks the delimiter rule is reported to `problems` and kept as best read.
 *
 * @example
 * readItems(['~V', 'VERS. 2.0 : version'], { letter: 'V', title: '~V', line: 1, start: 1, end: 2 }, warnings);
 * // → [{ mnemonic: 'VERS', unit: '', value: '2.0', description: 'version', line: 2 }]
 */
export function readItems(lines: string[], section: RawSection, problems: ProblemList): HeaderItem[] {
  const items: HeaderItem[] = [];
  for (let i = section.start; i < section.end; i++) {
    const s = lines[i];
    if (s.length > MAX_LINE_LENGTH) continue; // reported by findSections
    const at = firstNonBlank(s);
    if (at < 0 || s.charCodeAt(at) === 35 /* # */) continue;
    const { item, problem } = parseHeaderLine(s, i + 1);
    if (problem) problems.add(i + 1, problem);
    if (item.mnemonic !== '') items.push(item);
  }
  return items;
}

/**
 * The item with this mnemonic, compared case-insensitively (`mnemonic` upper case).
 *
 * @example
 * findItem(items, 'NULL')?.value; // → '-999.25'
 */
export function findItem(items: HeaderItem[], mnemonic: string): HeaderItem | undefined {
  return items.find((item) => item.mnemonic.toUpperCase() === mnemonic);
}

/**
 * Renames repeated curve mnemonics MNEM:1, MNEM:2, … as the standard suggests, with one warning each.
 *
 * @example
 * renameDuplicates(curveItems, warnings); // GR, GR → GR:1, GR:2
 */
export function renameDuplicates(items: HeaderItem[], warnings: ProblemList): void {
  const groups = new Map<string, HeaderItem[]>();
  for (const item of items) {
    const group = groups.get(item.mnemonic);
    if (group) group.push(item);
    else groups.set(item.mnemonic, [item]);
  }
  for (const [mnemonic, group] of groups) {
    if (group.length < 2) continue;
    group.forEach((item, k) => (item.mnemonic = `${mnemonic}:${k + 1}`));
    warnings.add(
      group[0].line,
      `curve mnemonic ${mnemonic} appears ${group.length} times (lines ${group.map((g) => g.line).join(', ')}); ` +
        `renamed ${group.map((g) => g.mnemonic).join(', ')}`,
    );
  }
}

/**
 * The free text of ~O, comment lines left out, outer blank lines trimmed.
 *
 * @example
 * readOther(['~O', 'Hand digitised.', ''], section); // → 'Hand digitised.'
 */
export function readOther(lines: string[], section: RawSection): string {
  const kept: string[] = [];
  for (let i = section.start; i < section.end; i++) {
    const s = lines[i];
    const at = firstNonBlank(s);
    if (at >= 0 && s.charCodeAt(at) === 35) continue;
    kept.push(s.trimEnd());
  }
  while (kept.length > 0 && kept[kept.length - 1] === '') kept.pop();
  while (kept.length > 0 && kept[0] === '') kept.shift();
  return kept.join('\n');
}
