import { describe, expect, it } from 'vitest';
import { integratePanels } from '@shared/pressure/gaussLegendre';

describe('integratePanels (10-point Gauss–Legendre)', () => {
  it('is exact for polynomials up to degree 19 on one panel', () => {
    // ∫0^1 x^19 dx = 1/20; ∫−1^1 x^18 dx = 2/19 (elementary calculus).
    expect(integratePanels((x) => x ** 19, [0, 1])).toBeCloseTo(1 / 20, 15);
    expect(integratePanels((x) => x ** 18, [-1, 1])).toBeCloseTo(2 / 19, 15);
  });

  it('integrates a Gaussian over split panels', () => {
    // ∫−6^6 e^{−x²} dx = √π·erf(6) ≈ √π to 1e-17.
    const breaks = Array.from({ length: 25 }, (_, i) => -6 + i * 0.5);
    expect(integratePanels((x) => Math.exp(-x * x), breaks)).toBeCloseTo(Math.sqrt(Math.PI), 13);
  });
});
