/**
 * Names for open water: Natural Earth's land and countries carry none, and a chart without them reads
 * as a blank. Positions are open-water points chosen by eye (value recalled from memory); a unit test
 * checks every one of them lies off Natural Earth's land.
 */
import type { FeatureCollection, Point } from 'geojson';

export interface SeaLabelProps {
  name: string;
  kind: 'ocean' | 'sea';
  minzoom: number;
}

const OCEAN_MINZOOM = 1;
const SEA_MINZOOM = 3;
const NARROW_SEA_MINZOOM = 4;

/** [name, lon, lat, minzoom] */
const WATERS: ReadonlyArray<readonly [string, number, number, number]> = [
  ['North Pacific Ocean', -150, 30, OCEAN_MINZOOM],
  ['South Pacific Ocean', -120, -30, OCEAN_MINZOOM],
  ['North Atlantic Ocean', -40, 35, OCEAN_MINZOOM],
  ['South Atlantic Ocean', -15, -30, OCEAN_MINZOOM],
  ['Indian Ocean', 80, -20, OCEAN_MINZOOM],
  ['Southern Ocean', 40, -60, OCEAN_MINZOOM],
  ['Arctic Ocean', 150, 80, OCEAN_MINZOOM],
  ['North Sea', 3.5, 56, SEA_MINZOOM],
  ['Norwegian Sea', 3, 68, SEA_MINZOOM],
  ['Barents Sea', 40, 74, SEA_MINZOOM],
  ['Beaufort Sea', -140, 72, SEA_MINZOOM],
  ['Labrador Sea', -55, 58, SEA_MINZOOM],
  ['Gulf of Mexico', -90, 25, SEA_MINZOOM],
  ['Caribbean Sea', -75, 15, SEA_MINZOOM],
  ['Mediterranean Sea', 18, 34.5, SEA_MINZOOM],
  ['Gulf of Guinea', 2, 2, SEA_MINZOOM],
  ['Arabian Sea', 64, 14, SEA_MINZOOM],
  ['Bay of Bengal', 88, 14, SEA_MINZOOM],
  ['South China Sea', 114, 13, SEA_MINZOOM],
  ['Java Sea', 111, -5, SEA_MINZOOM],
  ['Timor Sea', 126, -11, SEA_MINZOOM],
  ['Coral Sea', 156, -18, SEA_MINZOOM],
  ['Tasman Sea', 160, -38, SEA_MINZOOM],
  ['Bering Sea', -178, 58, SEA_MINZOOM],
  ['Sea of Okhotsk', 150, 53, SEA_MINZOOM],
  ['Baltic Sea', 19.5, 55.7, NARROW_SEA_MINZOOM],
  ['Black Sea', 34, 43.3, NARROW_SEA_MINZOOM],
  ['Caspian Sea', 51, 42, NARROW_SEA_MINZOOM],
  ['Red Sea', 38.5, 20, NARROW_SEA_MINZOOM],
  ['Persian Gulf', 51, 27, NARROW_SEA_MINZOOM],
];

/**
 * Label points for oceans and larger seas, in a fixed order.
 * @example seaLabels().features[0].properties.name // 'North Pacific Ocean'
 */
export function seaLabels(): FeatureCollection<Point, SeaLabelProps> {
  return {
    type: 'FeatureCollection',
    features: WATERS.map(([name, lon, lat, minzoom]) => ({
      type: 'Feature',
      properties: { name, kind: name.endsWith('Ocean') ? 'ocean' : 'sea', minzoom },
      geometry: { type: 'Point', coordinates: [lon, lat] },
    })),
  };
}
