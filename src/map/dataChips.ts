/** What a data chip says about a well: what it holds, never a verdict, so none is drawn as a warning or an error. */
export type DataChipType = 'info' | 'default';

export interface DataChip {
  key: 'pressures' | 'logs' | 'lot' | 'survey' | 'tops';
  label: string;
  type: DataChipType;
}

export interface WellDataFacts {
  pressureCount: number;
  logCount: number;
  hasLot: boolean;
  hasSurvey: boolean;
  topCount?: number;
}

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * The chips for the data a well holds, for the map's well card (`long`) and the offset table (`short`).
 * Pressure data and leak-off tests are what offsets are picked for, so they get the informational colour;
 * the rest stay neutral. Red and amber are kept for real problems (a doubtful test, an unsaved change).
 * @example dataChips({ pressureCount: 3, logCount: 0, hasLot: true, hasSurvey: false }, 'short')
 * // [{ key: 'pressures', label: 'P 3', type: 'info' }, { key: 'lot', label: 'LOT', type: 'info' }]
 */
export function dataChips(w: WellDataFacts, style: 'long' | 'short'): DataChip[] {
  const short = style === 'short';
  const chips: DataChip[] = [];
  if (short ? w.pressureCount > 0 : true) {
    chips.push({
      key: 'pressures',
      label: short ? `P ${w.pressureCount}` : plural(w.pressureCount, 'pressure'),
      type: w.pressureCount > 0 ? 'info' : 'default',
    });
  }
  if (short ? w.logCount > 0 : true)
    chips.push({ key: 'logs', label: short ? `Logs ${w.logCount}` : plural(w.logCount, 'log curve'), type: 'default' });
  if (w.hasLot) chips.push({ key: 'lot', label: 'LOT', type: 'info' });
  if (w.hasSurvey) chips.push({ key: 'survey', label: short ? 'Svy' : 'Survey', type: 'default' });
  if (!short && (w.topCount ?? 0) > 0) chips.push({ key: 'tops', label: `${w.topCount} tops`, type: 'default' });
  return chips;
}
