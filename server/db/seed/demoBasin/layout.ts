import type { WellStatus } from '../../../../shared/schemas/wells';
import { BASIN_HALF_M, toLocalM, toLonLat } from './frame';
import { DEMO_FIELDS, DEMO_OPERATORS, DEMO_WELL_COUNT, EXPLORATION_PREFIX, demoUwi } from './names';
import type { PathDesign, WellProfile } from './path';
import { makeRng, subSeed, type Rng } from './prng';
import { waterDepthAtM } from './surfaces';
import type { WellSpec } from './well';

/**
 * Where the demo wells are and what each is like: clusters of field wells around invented fields and
 * exploration wells between them, a third drilled directionally, spud dates 1994–2022, a few stopped
 * above the top of overpressure, and a handful chosen to take a kick or lose mud.
 */
export const LAYOUT_COUNTS = { buildAndHold: 13, sShape: 7, stoppedAboveTop: 6, kicks: 4, losses: 4 } as const;

const SPUD_FROM = Date.UTC(1994, 0, 1);
const SPUD_DAYS = Math.round((Date.UTC(2022, 11, 31) - SPUD_FROM) / 86_400_000);

interface Site {
  xM: number;
  yM: number;
  field: number | null;
  spudDay: number;
}

function shuffled<T>(rng: Rng, items: readonly T[]): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = rng.int(0, i);
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

function place(rng: Rng): Site[] {
  const sites: Site[] = [];
  const far = (x: number, y: number, min: number, among: Site[]) => among.every((s) => Math.hypot(s.xM - x, s.yM - y) >= min);
  DEMO_FIELDS.forEach((f, fi) => {
    const mine: Site[] = [];
    for (let tries = 0; mine.length < f.wells && tries < 1000; tries++) {
      const r = 2500 * Math.sqrt(rng.uniform());
      const t = rng.uniform(0, 2 * Math.PI);
      const x = f.centreM.xM + r * Math.cos(t);
      const y = f.centreM.yM + r * Math.sin(t);
      if (far(x, y, 400, mine)) mine.push({ xM: x, yM: y, field: fi, spudDay: 0 });
    }
    sites.push(...mine);
  });
  for (let tries = 0; sites.length < DEMO_WELL_COUNT && tries < 10_000; tries++) {
    const x = rng.uniform(-BASIN_HALF_M.x + 3000, BASIN_HALF_M.x - 3000);
    const y = rng.uniform(-BASIN_HALF_M.y + 3000, BASIN_HALF_M.y - 3000);
    if (far(x, y, 3000, sites)) sites.push({ xM: x, yM: y, field: null, spudDay: 0 });
  }
  if (sites.length !== DEMO_WELL_COUNT) throw new Error(`demo layout: placed ${sites.length} of ${DEMO_WELL_COUNT} wells`);
  for (const s of sites) s.spudDay = rng.int(0, SPUD_DAYS);
  return sites;
}

function design(rng: Rng, profile: WellProfile, mudlineTvdM: number): PathDesign {
  const r1 = (v: number) => Math.round(v * 10) / 10;
  return {
    profile,
    kickOffMdM: Math.round((mudlineTvdM + rng.uniform(300, 1000)) / 10) * 10,
    buildDegPer30m: r1(rng.uniform(1.5, 3)),
    holdIncDeg: r1(profile === 's-shape' ? rng.uniform(18, 32) : rng.uniform(20, 50)),
    aziDeg: r1(rng.uniform(0, 360)),
    tangentM: Math.round(rng.uniform(500, 1100)),
    dropDegPer30m: r1(rng.uniform(1, 2)),
    finalIncDeg: r1(rng.uniform(0, 4)),
  };
}

/**
 * The specs of all demo wells, in a stable order (fields first, then exploration wells).
 * @example
 * demoWellSpecs(2026).length; // 60
 */
export function demoWellSpecs(seed: number): WellSpec[] {
  const rng = makeRng(subSeed(seed, 'layout'));
  const sites = place(rng);
  // Round the wellhead to 1e-6° first, so the stored lon/lat and the truth share one point.
  for (const s of sites) {
    const ll = toLonLat(s.xM, s.yM);
    const local = toLocalM(Math.round(ll.lon * 1e6) / 1e6, Math.round(ll.lat * 1e6) / 1e6);
    s.xM = local.xM;
    s.yM = local.yM;
  }
  const order = shuffled(
    rng,
    sites.map((_, i) => i),
  );
  const profiles: WellProfile[] = sites.map(() => 'vertical');
  order.slice(0, LAYOUT_COUNTS.buildAndHold).forEach((i) => (profiles[i] = 'build-and-hold'));
  order.slice(LAYOUT_COUNTS.buildAndHold, LAYOUT_COUNTS.buildAndHold + LAYOUT_COUNTS.sShape).forEach((i) => (profiles[i] = 's-shape'));
  const rest = order.slice(LAYOUT_COUNTS.buildAndHold + LAYOUT_COUNTS.sShape);
  const shallow = new Set(rest.slice(0, LAYOUT_COUNTS.stoppedAboveTop));
  const deep = shuffled(
    rng,
    order.filter((i) => !shallow.has(i)),
  );
  const kicks = new Set(deep.slice(0, LAYOUT_COUNTS.kicks));
  const losses = new Set(deep.slice(LAYOUT_COUNTS.kicks, LAYOUT_COUNTS.kicks + LAYOUT_COUNTS.losses));

  // Names: field wells numbered in spud order within their field; exploration wells across the basin.
  const bySpud = sites.map((_, i) => i).sort((a, b) => sites[a].spudDay - sites[b].spudDay || a - b);
  const names: string[] = new Array(sites.length);
  const counters = new Map<string, number>();
  for (const i of bySpud) {
    const key = sites[i].field === null ? EXPLORATION_PREFIX : DEMO_FIELDS[sites[i].field!].name;
    const n = (counters.get(key) ?? 0) + 1;
    counters.set(key, n);
    names[i] = sites[i].field === null ? `${EXPLORATION_PREFIX}-${String(n).padStart(2, '0')}` : `${key}-${n}`;
  }

  return sites.map((s, i) => {
    const operatorIndex = s.field === null ? rng.int(0, DEMO_OPERATORS.length - 1) : DEMO_FIELDS[s.field].operator;
    const airGapM = Math.round(rng.uniform(22, 28) * 10) / 10;
    const status: WellStatus =
      s.field === null
        ? rng.chance(0.7)
          ? 'abandoned'
          : rng.chance(0.6)
            ? 'suspended'
            : 'drilled'
        : rng.chance(0.8)
          ? 'drilled'
          : 'suspended';
    const deepEnough = kicks.has(i) ? rng.uniform(900, 1400) : rng.uniform(500, 1400);
    return {
      index: i,
      name: names[i],
      uwi: demoUwi(operatorIndex, bySpud.indexOf(i) + 1),
      operatorIndex,
      xM: s.xM,
      yM: s.yM,
      airGapM,
      spudDate: new Date(SPUD_FROM + s.spudDay * 86_400_000).toISOString().slice(0, 10),
      status,
      design: design(rng, profiles[i], airGapM + waterDepthAtM(s.xM, s.yM)),
      tdBelowTopM: shallow.has(i) ? -rng.uniform(150, 500) : deepEnough,
      ...(kicks.has(i) && { kickBelowTopM: rng.uniform(150, 350) }),
      ...(losses.has(i) && { lossAtFraction: rng.uniform(0.25, 0.8) }),
    };
  });
}
