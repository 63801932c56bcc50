import { generateDemoBasin, type DemoBasin } from '../../../server/db/seed/demoBasin/generate';

// One generation per test file (about a second): the files share this cache within their worker.
let noisy: DemoBasin | undefined;
let clean: DemoBasin | undefined;

/** The demo basin as seeded (seed 2026, noise and sands on). */
export function demo(): DemoBasin {
  return (noisy ??= generateDemoBasin());
}

/** The same basin with noise-free, sand-free logs, for exact inversions. */
export function cleanDemo(): DemoBasin {
  return (clean ??= generateDemoBasin(2026, { noise: false, sands: false }));
}

/** Standard gravity, m/s² (3rd CGPM, 1901). */
export const g = 9.80665;
/** 1 ppg in kg/m3: 1 SG = 8.345404 ppg (docs/sources.md [units]). */
export const PPG = 1000 / 8.345404;
