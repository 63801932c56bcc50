import type { ProfileInterpretation } from './buildProfile';
import type { TrendSettings } from './trend';

/** What an interpretation's top-of-overpressure pick records, as far as a file needs it. */
export interface DescribedTop {
  tvdM: number;
  method: string;
  confidence: string;
  marginKgM3: number;
  minThicknessM: number;
}

const num = (v: number, digits = 4) => String(Number(v.toPrecision(digits)));

function trendText(t: TrendSettings): string {
  const p = t.params;
  const form =
    t.model === 'exponential'
      ? `Δt_n = ${num(p.matrix)} + (${num(p.surface)} − ${num(p.matrix)})·exp(−${num(p.cPerM)}·z) µs/ft`
      : `log10 R_n = ${num(p.a)} + ${num(p.b)}·z (ohm·m)`;
  const shale = t.gammaCutoffApi === null ? 'all samples' : `shale samples (gamma ray ≥ ${t.gammaCutoffApi} API)`;
  return `${t.curve}, ${form}, z below mudline in m; fitted over ${num(t.fromM, 6)}–${num(t.toM, 6)} m TVD below the rig datum on ${shale}`;
}

/**
 * The settings behind an exported profile as `key: value` lines, so whoever receives the file can reproduce the
 * curves: normal fluid, normal trend, pore-pressure method with its parameters and smoothing, fracture method, TOP pick.
 * @example describeInterpretation({ normalDensityKgM3: 1030, trend: null, pore: { method: 'eaton-sonic', exponent: 3 }, fracture: null })['Pore pressure'];
 * // 'Eaton (1975) on sonic, exponent 3; log as recorded'
 */
export function describeInterpretation(c: ProfileInterpretation, top?: DescribedTop | null): Record<string, string> {
  const out: Record<string, string> = { 'Normal pore fluid': `${num(c.normalDensityKgM3)} kg/m3` };
  out['Normal compaction trend'] = c.trend ? trendText(c.trend) : 'none';
  if (!c.pore) out['Pore pressure'] = 'none';
  else {
    const smoothing = c.pore.smoothingM ? `log smoothed by a ${num(c.pore.smoothingM)} m running median` : 'log as recorded';
    const method =
      c.pore.method === 'bowers'
        ? `Bowers (1995), V0 ${num(c.pore.v0)} ft/s, A ${num(c.pore.A)}, B ${num(c.pore.B)} (V in ft/s, σ in psi)${
            c.pore.unloading ? `, unloading from ${num(c.pore.unloading.vMaxMs)} m/s with U ${num(c.pore.unloading.U)}` : ', loading only'
          }`
        : `Eaton (1975) on ${c.pore.method === 'eaton-sonic' ? 'sonic' : 'resistivity'}, exponent ${num(c.pore.exponent)}`;
    out['Pore pressure'] = `${method}; ${smoothing}`;
  }
  const f = c.fracture;
  out['Fracture pressure'] = !f
    ? 'none'
    : f.method === 'eaton'
      ? `Eaton (1969), Poisson's ratio ${num(f.poissonTop)} at the mudline ${f.poissonGradientPerKm >= 0 ? '+' : '−'} ${num(Math.abs(f.poissonGradientPerKm))} per km`
      : `Matthews & Kelly (1967), Ki ${num(f.ki)}`;
  if (top !== undefined) {
    out['Top of overpressure'] = top
      ? `${num(top.tvdM, 6)} m TVD below the rig datum (${top.method}, ${top.confidence} confidence; margin ${num(top.marginKgM3)} kg/m3 EMW over at least ${num(top.minThicknessM)} m)`
      : 'not picked';
  }
  return out;
}
