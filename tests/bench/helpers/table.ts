import type { Row } from './types';

function format(value: number | undefined): string {
  if (value === undefined) return '';
  if (!Number.isFinite(value)) return String(value);
  const a = Math.abs(value);
  if (a === 0) return '0';
  if (a >= 1e5 || a < 1e-3) return value.toExponential(2);
  if (a >= 100) return value.toFixed(0);
  if (a >= 1) return value.toFixed(2);
  return value.toPrecision(3);
}

/** Speed-up for times (reference ÷ ours, > 1 means we are faster); blank for other figures. */
function ratio(row: Row): string {
  if (row.reference === undefined || row.unit !== 'ms' || row.ours <= 0) return '';
  return `${(row.reference / row.ours).toFixed(2)}×`;
}

/** Prints the rows of every section as one aligned table. */
export function printTable(sections: { name: string; rows: Row[] }[]): void {
  const header = ['section', 'metric', 'ours', 'reference', 'speed-up', 'unit', 'note'];
  const lines: string[][] = [header];
  for (const s of sections) {
    for (const r of s.rows) lines.push([s.name, r.metric, format(r.ours), format(r.reference), ratio(r), r.unit, r.note ?? '']);
  }
  const widths = header.map((_, c) => Math.max(...lines.map((l) => l[c].length)));
  const render = (l: string[]): string =>
    l
      .map((cell, c) => (c >= 2 && c <= 4 ? cell.padStart(widths[c]) : cell.padEnd(widths[c])))
      .join('  ')
      .trimEnd();
  console.log(render(lines[0]));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const l of lines.slice(1)) console.log(render(l));
}
