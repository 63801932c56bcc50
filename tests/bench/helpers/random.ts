import { mulberry32 } from '../../../shared/random/mulberry32';

/**
 * `count` wells scattered over a square of side `sizeM`, with a smooth value field (a few random cosine waves,
 * an overpressure-like surface) plus a little noise. Deterministic for a given seed.
 */
export function syntheticWells(count: number, sizeM: number, seed: number): { x: number; y: number; value: number }[] {
  const random = mulberry32(seed);
  const waves = Array.from({ length: 6 }, () => ({
    kx: ((random() - 0.5) * 2 * Math.PI * 4) / sizeM,
    ky: ((random() - 0.5) * 2 * Math.PI * 4) / sizeM,
    phase: random() * 2 * Math.PI,
    amplitude: 50 + 100 * random(),
  }));
  const wells: { x: number; y: number; value: number }[] = [];
  for (let i = 0; i < count; i++) {
    const x = random() * sizeM;
    const y = random() * sizeM;
    let value = 1000;
    for (const w of waves) value += w.amplitude * Math.cos(w.kx * x + w.ky * y + w.phase);
    wells.push({ x, y, value: value + 10 * (random() - 0.5) });
  }
  return wells;
}
