import type { ProblemList } from '../problem';
import { findItem, readItems } from './headerSections';
import type { RawSection } from './lasLines';

export const LAS3_MESSAGE = 'LAS 3.0 is not supported; save as LAS 2.0';

export interface VersionInfo {
  version: number | null;
  /** Null when WRAP is missing or unreadable (an error says so). */
  wrap: 'YES' | 'NO' | null;
  /** Set for LAS 3.x: the caller stops there. */
  las3Line?: number;
}

/**
 * Reads VERS and WRAP from ~V (CWLS LAS 2.0, §5.3): 2.0 is read, 1.2 is read best-effort with a warning,
 * 3.0 is refused, anything else is an error.
 *
 * @example
 * readVersion(lines, versionSection, errors, warnings); // → { version: 2, wrap: 'NO' }
 */
export function readVersion(lines: string[], section: RawSection, errors: ProblemList, warnings: ProblemList): VersionInfo {
  const items = readItems(lines, section, warnings);
  const info: VersionInfo = { version: null, wrap: null };

  const vers = findItem(items, 'VERS');
  if (!vers) errors.add(section.line, 'VERS is missing from ~V');
  else {
    const version = vers.value === '' ? NaN : Number(vers.value);
    info.version = Number.isNaN(version) ? null : version;
    if (version >= 3 && version < 4) {
      errors.add(vers.line, LAS3_MESSAGE);
      info.las3Line = vers.line;
      return info;
    }
    if (version >= 1 && version < 2) warnings.add(vers.line, `LAS ${vers.value} file: read as LAS 2.0, best effort`);
    else if (version !== 2) errors.add(vers.line, `VERS '${vers.value}' is not 2.0`);
  }

  const wrap = findItem(items, 'WRAP');
  if (!wrap) errors.add(section.line, 'WRAP is missing from ~V');
  else {
    const w = wrap.value.toUpperCase();
    if (w === 'YES' || w === 'NO') info.wrap = w;
    else errors.add(wrap.line, `WRAP must be YES or NO, found '${wrap.value}'`);
  }
  return info;
}
