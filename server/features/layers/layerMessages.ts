/**
 * Where a JSON.parse failure is, as line and column (editors count lines, not characters), and the parser's words
 * without the character offset.
 * @example jsonErrorAt('{\n  "a": [1 2]\n}', new SyntaxError("Expected ',' or ']' after array element in JSON at position 12"));
 * // "line 2, column 11: Expected ',' or ']' after array element"
 */
export function jsonErrorAt(text: string, err: Error): string {
  const words = err.message.replace(/\s*in JSON at position \d+.*$/, '').replace(/\s*\(line \d+ column \d+\)$/, '');
  const m = /position (\d+)/.exec(err.message);
  if (!m) return words;
  const pos = Math.min(Number(m[1]), text.length);
  const before = text.slice(0, pos);
  const line = before.split('\n').length;
  const column = pos - before.lastIndexOf('\n');
  return `line ${line}, column ${column}: ${words}`;
}

/**
 * PostGIS's ST_IsValidReason in plain words, with the feature's name when it has one and the place as lon/lat.
 * @example invalidGeometryMessage(1, { name: 'Bowtie' }, 'Self-intersection[-101.225 -32.625]');
 * // 'Feature 1 ("Bowtie") is not a valid geometry: its outline crosses itself near lon -101.225, lat -32.625.'
 */
export function invalidGeometryMessage(n: number, properties: Record<string, unknown> | null | undefined, reason: string): string {
  const name = typeof properties?.name === 'string' && properties.name.trim() ? ` ("${properties.name.trim()}")` : '';
  const m = /^(.*?)\[(-?[\d.eE+-]+) (-?[\d.eE+-]+)\]$/.exec(reason.trim());
  const what = m ? m[1] : reason.trim();
  const where = m ? ` near lon ${Number(m[2])}, lat ${Number(m[3])}` : '';
  const plain: Record<string, string> = {
    'Self-intersection': 'its outline crosses itself',
    'Ring Self-intersection': 'a ring touches itself',
    'Too few points': 'it has too few points',
    'Hole lies outside shell': 'a hole lies outside its outline',
    'Interior is disconnected': 'a hole cuts it in two',
    'Nested shells': 'one part lies inside another',
  };
  return `Feature ${n}${name} is not a valid geometry: ${plain[what] ?? what.toLowerCase()}${where}.`;
}
