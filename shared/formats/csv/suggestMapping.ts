import { splitHeaderUnit } from './headerUnit';

/** A field the importer can fill, with the other names a column for it commonly has. */
export interface MappableField {
  key: string;
  aliases: string[];
}

export interface ColumnMatch {
  column: string;
  field: string | null;
  /** The unit found in the header, as written. */
  unit?: string;
}

/** Case, spaces, underscores, hyphens and dots do not distinguish names ("Pore_Pressure" = "pore pressure"). */
function normalise(name: string): string {
  return name.toLowerCase().replace(/[\s_.-]+/g, '');
}

/**
 * For each column, the field it most likely holds and the unit its header names. A column matches when
 * its whole header or its name without the unit equals a field key or alias; each field goes to the
 * first column that matches it.
 *
 * @example
 * suggestColumnMatches(['MD (ft)', 'Pressure [psi]', 'note'], [
 *   { key: 'md', aliases: ['measured depth', 'depth'] },
 *   { key: 'pressure', aliases: ['pore pressure', 'pp'] },
 * ]);
 * // → [{ column: 'MD (ft)', field: 'md', unit: 'ft' }, { column: 'Pressure [psi]', field: 'pressure', unit: 'psi' },
 * //    { column: 'note', field: null }]
 */
export function suggestColumnMatches(header: string[], fields: MappableField[]): ColumnMatch[] {
  const byName = new Map<string, string>();
  for (const field of fields) {
    for (const name of [field.key, ...field.aliases]) {
      const key = normalise(name);
      if (!byName.has(key)) byName.set(key, field.key);
    }
  }
  const taken = new Set<string>();
  return header.map((column) => {
    const { name, unit } = splitHeaderUnit(column);
    const candidate = byName.get(normalise(column)) ?? byName.get(normalise(name));
    const field = candidate !== undefined && !taken.has(candidate) ? candidate : null;
    if (field !== null) taken.add(field);
    return unit === undefined ? { column, field } : { column, field, unit };
  });
}

/**
 * The same as {@link suggestColumnMatches}, as a lookup from column to field key (null: leave unmapped).
 *
 * @example
 * suggestMapping(['depth_m', 'x'], [{ key: 'md', aliases: ['depth'] }]); // → { depth_m: 'md', x: null }
 */
export function suggestMapping(header: string[], fields: MappableField[]): Record<string, string | null> {
  const mapping: Record<string, string | null> = {};
  for (const match of suggestColumnMatches(header, fields)) mapping[match.column] = match.field;
  return mapping;
}
