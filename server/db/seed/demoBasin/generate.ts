import { BASIN_BBOX, BASIN_CENTRE, BASIN_SIZE_KM, toLocalM } from './frame';
import { demoWellSpecs } from './layout';
import { DEMO_TRENDS, type LogOptions } from './logs';
import { BASIN_DESCRIPTION, BASIN_NAME, DEMO_OPERATORS } from './names';
import { DEMO_PHYSICS } from './physics';
import { demoProspects, type DemoProspect } from './prospects';
import { FORMATIONS, hiddenTopTvdssAtM } from './surfaces';
import { buildWell, type DemoWell } from './well';

export const DEFAULT_DEMO_SEED = 2026;

export interface DemoBasin {
  basin: {
    name: string;
    description: string;
    seed: number;
    centre: { lon: number; lat: number };
    /** [west, south, east, north], WGS 84. */
    bbox: [number, number, number, number];
    sizeKm: { x: number; y: number };
    operators: string[];
    formations: { name: string; lithology: string }[];
    physics: typeof DEMO_PHYSICS;
    trends: typeof DEMO_TRENDS;
  };
  wells: DemoWell[];
  prospects: readonly DemoProspect[];
  truth: {
    /** The function that made the tops: `hiddenTopTvdssM(lon, lat)` in surfaces.ts. */
    topFunction: 'hiddenTopTvdssM(lon, lat) → TVDSS m';
    topAtWells: { name: string; lon: number; lat: number; topTvdssM: number }[];
    topAtPlannedWells: { name: string; lon: number; lat: number; topTvdssM: number }[];
  };
}

/**
 * The whole demo basin from one seed, with no I/O: the same seed gives the same numbers, byte for byte.
 * `logs` turns off noise and sands for tests that invert the logs exactly.
 * @example
 * const demo = generateDemoBasin();
 * demo.wells.length; // 60
 */
export function generateDemoBasin(seed = DEFAULT_DEMO_SEED, logs: LogOptions = {}): DemoBasin {
  const wells = demoWellSpecs(seed)
    .map((spec) => buildWell(spec, seed, logs))
    .sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  const topAt = (lon: number, lat: number) => {
    const { xM, yM } = toLocalM(lon, lat);
    return hiddenTopTvdssAtM(xM, yM);
  };
  return {
    basin: {
      name: BASIN_NAME,
      description: BASIN_DESCRIPTION,
      seed,
      centre: { ...BASIN_CENTRE },
      bbox: BASIN_BBOX,
      sizeKm: { ...BASIN_SIZE_KM },
      operators: DEMO_OPERATORS.map((o) => o.name),
      formations: FORMATIONS.map((f) => ({ name: f.name, lithology: f.lithology })),
      physics: DEMO_PHYSICS,
      trends: DEMO_TRENDS,
    },
    wells,
    prospects: demoProspects,
    truth: {
      topFunction: 'hiddenTopTvdssM(lon, lat) → TVDSS m',
      topAtWells: wells.map((w) => ({ name: w.name, lon: w.lon, lat: w.lat, topTvdssM: topAt(w.lon, w.lat) })),
      topAtPlannedWells: demoProspects.flatMap((p) =>
        p.plannedWells.map((w) => ({ name: w.name, lon: w.lon, lat: w.lat, topTvdssM: topAt(w.lon, w.lat) })),
      ),
    },
  };
}
