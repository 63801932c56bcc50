/** Mulberry32, a small seeded PRNG (deterministic across runs; not for cryptography). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * `count` wells scattered over a square of side `sizeM`, with a smooth value field (a few random cosine waves,
 * an overpressure-like surface) plus a little noise. Deterministic for a given seed.
 */
export function syntheticWells(count: number, sizeM: number, seed: number): { x: number; y: number; value: number }[] {
  const random = seededRandom(seed);
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
