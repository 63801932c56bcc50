/**
 * Splits a label into lines of at most `maxChars` characters at spaces (a word longer than that gets its own line),
 * so legend entries never run into the plot. Text widths are estimated from character counts because the layout
 * is computed without a DOM (≈ 0.56 em per character of Inter at small sizes, common practice, no source).
 * @example wrapLabel('Formation test (tight, supercharged or doubtful)', 22);
 * // ['Formation test (tight,', 'supercharged or', 'doubtful)']
 */
export function wrapLabel(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if (!current) current = word;
    else if (current.length + 1 + word.length <= maxChars) current += ` ${word}`;
    else {
      lines.push(current);
      current = word;
    }
  }
  if (current) lines.push(current);
  return lines;
}

/** Characters of the legend's font size that fit in `widthPx`. */
export function charsThatFit(widthPx: number, fontPx: number): number {
  return Math.max(6, Math.floor(widthPx / (fontPx * 0.56)));
}

export interface LegendEntry {
  key: string;
  label: string;
}

export interface PlacedEntry<E extends LegendEntry> {
  entry: E;
  lines: string[];
  y: number;
}

/**
 * Stacks entries top-down with their wrapped lines, `lineHeight` apart and `gap` between entries.
 * @example stackLegend([{ key: 'a', label: 'Pore pressure' }], 150, 11, 18)[0].y; // 18
 */
export function stackLegend<E extends LegendEntry>(
  entries: readonly E[],
  widthPx: number,
  fontPx: number,
  top: number,
  lineHeight = 14,
  gap = 6,
): PlacedEntry<E>[] {
  const max = charsThatFit(widthPx, fontPx);
  let y = top;
  return entries.map((entry) => {
    const lines = wrapLabel(entry.label, max);
    const placed = { entry, lines, y };
    y += lines.length * lineHeight + gap;
    return placed;
  });
}
