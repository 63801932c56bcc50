import { gibsonExcessRatio, type CompactionScreen } from '@shared/pressure';

/**
 * Gibson's (1958) excess-pressure ratio at the base of the layer against T on a log-spaced grid, for the
 * small screening plot.
 * @example excessRatioCurve(1e-3, 1e2, 61)[0]; // { T: 0.001, ratio: ≈ 0.02 }
 */
export function excessRatioCurve(minT: number, maxT: number, n = 61): { T: number; ratio: number }[] {
  if (!(minT > 0) || !(maxT > minT) || n < 2) throw new Error('excessRatioCurve: need 0 < minT < maxT and n >= 2');
  const a = Math.log10(minT);
  const b = Math.log10(maxT);
  return Array.from({ length: n }, (_, i) => {
    const T = 10 ** (a + ((b - a) * i) / (n - 1));
    return { T, ratio: gibsonExcessRatio({ T, zeta: 0 }) };
  });
}

/**
 * A span of years the way a person says it: "~40 years", "~35,000 years", "~2.4 million years".
 * @example formatYears(34_812); // '~35,000 years'
 */
export function formatYears(years: number): string {
  if (!Number.isFinite(years)) return 'an unbounded time';
  if (years >= 1e6) return `~${(years / 1e6).toPrecision(2).replace(/\.0$/, '')} million years`;
  if (years < 1) return years * 365.25 >= 1 ? `~${Math.round(years * 365.25)} days` : 'less than a day';
  return `~${Number(years.toPrecision(2)).toLocaleString('en')} years`;
}

/**
 * The plain-language reading of a screen: compare drainage time with burial time and say what it suggests.
 * @example compactionReading({ tauYears: 3.5e4, burialYears: 4e6, T: 0.009, verdict: 'likely-drained', … });
 * // 'The layer drains in ~35,000 years but was buried over ~4 million years: pressure likely bled off as it was buried.'
 */
export function compactionReading(screen: Pick<CompactionScreen, 'tauYears' | 'burialYears' | 'verdict'>): string {
  const drain = formatYears(screen.tauYears);
  const burial = formatYears(screen.burialYears);
  if (screen.verdict === 'likely-retained')
    return `The layer drains in ${drain} but was buried over ${burial}: burial outpaced drainage, so pressure is likely retained.`;
  if (screen.verdict === 'likely-drained')
    return `The layer drains in ${drain} but was buried over ${burial}: pressure likely bled off as it was buried (near hydrostatic).`;
  return `The layer drains in ${drain} and was buried over ${burial}: the two are comparable, so some excess pressure may be retained.`;
}
