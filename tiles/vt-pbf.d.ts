// vt-pbf ships no types; this covers the one function the build uses.
declare module 'vt-pbf' {
  import type { LegacyTile } from 'geojson-vt';

  export function fromGeojsonVt(layers: Record<string, LegacyTile>, options?: { version?: number; extent?: number }): Uint8Array;
}
