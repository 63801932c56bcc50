/**
 * Composite Gauss–Legendre quadrature (10 nodes per panel). Own code: a dozen lines, and no
 * numerical-integration package is among the project's dependencies.
 */

// Nodes and weights of the 10-point rule on [−1, 1] (Abramowitz & Stegun 1964, Table 25.4; value recalled
// from memory, checked: the weights sum to 2 and the rule integrates x^18 exactly).
const NODES = [
  -0.9739065285171717, -0.8650633666889845, -0.6794095682990244, -0.4333953941292472, -0.1488743389816312, 0.1488743389816312,
  0.4333953941292472, 0.6794095682990244, 0.8650633666889845, 0.9739065285171717,
];
const WEIGHTS = [
  0.0666713443086881, 0.1494513491505806, 0.219086362515982, 0.2692667193099963, 0.2955242247147529, 0.2955242247147529, 0.2692667193099963,
  0.219086362515982, 0.1494513491505806, 0.0666713443086881,
];

/**
 * ∫ f over consecutive panels [breaks[k], breaks[k+1]].
 * @example integratePanels((x) => x * x, [0, 0.5, 1]) // 1/3
 */
export function integratePanels(f: (x: number) => number, breaks: readonly number[]): number {
  let sum = 0;
  for (let k = 0; k + 1 < breaks.length; k++) {
    const half = (breaks[k + 1] - breaks[k]) / 2;
    if (half <= 0) continue;
    const mid = (breaks[k + 1] + breaks[k]) / 2;
    let panel = 0;
    for (let j = 0; j < NODES.length; j++) panel += WEIGHTS[j] * f(mid + half * NODES[j]);
    sum += panel * half;
  }
  return sum;
}
