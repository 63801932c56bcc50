/**
 * An independent solution of Gibson's (1958, Géotechnique 8, 171–182) moving-boundary problem by finite
 * differences, to check the closed-form quadrature in shared/pressure/gibson.ts against.
 *
 * Consolidation with loading, ∂u/∂t = c_v ∂²u/∂z² + γ′·dh/dt, h = m·t, ∂u/∂z = 0 at the base z = 0 and
 * u = 0 at the top z = h. With u = γ′h·w(ξ, T), ξ = z/h, T = m²t/c_v and s = ln T this becomes
 *
 *   ∂w/∂s = (1/T)·∂²w/∂ξ² + ξ·∂w/∂ξ − w + 1  on the fixed domain 0 ≤ ξ ≤ 1,
 *
 * started at a small T0 from its small-T limit w = T0(1 − ξ²)/2 and marched implicitly (one backward
 * Euler step, then BDF2) with central differences in ξ. Resolution is chosen for T ≤ ~300
 * (cell Péclet number T·Δξ < 2, base boundary layer 1/√T resolved by many cells).
 */
export function gibsonByFiniteDifference(targetT: number, cells = 800, maxStep = 0.005, startT = 1e-4): Float64Array {
  const h = 1 / cells;
  const nodes = cells; // unknowns w_0 … w_{cells−1}; w_cells = 0 at the drained top
  let previous = new Float64Array(nodes);
  let current = new Float64Array(nodes);
  for (let j = 0; j < nodes; j++) current[j] = (startT * (1 - (j * h) ** 2)) / 2;

  const s0 = Math.log(startT);
  const s1 = Math.log(targetT);
  const steps = Math.max(2, Math.ceil((s1 - s0) / maxStep));
  const ds = (s1 - s0) / steps;

  const lower = new Float64Array(nodes);
  const diag = new Float64Array(nodes);
  const upper = new Float64Array(nodes);
  const rhs = new Float64Array(nodes);
  for (let step = 1; step <= steps; step++) {
    const T = Math.exp(s0 + step * ds);
    const D = 1 / T;
    const bdf2 = step > 1;
    const c = bdf2 ? 3 / (2 * ds) : 1 / ds;
    for (let j = 0; j < nodes; j++) {
      const xi = j * h;
      let lo = 0;
      let up: number;
      const di = (-2 * D) / (h * h) - 1;
      if (j === 0)
        up = (2 * D) / (h * h); // mirror node for the no-flow base
      else {
        lo = D / (h * h) - xi / (2 * h);
        up = D / (h * h) + xi / (2 * h);
      }
      lower[j] = -lo;
      diag[j] = c - di;
      upper[j] = j === nodes - 1 ? 0 : -up; // w at the top is 0
      rhs[j] = (bdf2 ? (4 * current[j] - previous[j]) / (2 * ds) : current[j] / ds) + 1;
    }
    // Thomas algorithm.
    for (let j = 1; j < nodes; j++) {
      const factor = lower[j] / diag[j - 1];
      diag[j] -= factor * upper[j - 1];
      rhs[j] -= factor * rhs[j - 1];
    }
    const next = new Float64Array(nodes);
    next[nodes - 1] = rhs[nodes - 1] / diag[nodes - 1];
    for (let j = nodes - 2; j >= 0; j--) next[j] = (rhs[j] - upper[j] * next[j + 1]) / diag[j];
    previous = current;
    current = next;
  }
  const profile = new Float64Array(cells + 1);
  profile.set(current);
  return profile; // w at ξ = j/cells, j = 0 … cells
}
