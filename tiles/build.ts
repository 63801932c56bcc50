/**
 * `npm run tiles:build`: builds tiles/basemap.pmtiles from Natural Earth (world-atlas) and copies the
 * label fonts to tiles/fonts/. Reproducible: the same packages give the same bytes on every run.
 */
import { copyFileSync, mkdirSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { Compression, TileType } from 'pmtiles';
import { cutTiles, ZOOM_BANDS } from './cutTiles';
import { BASEMAP_FONTS, FONT_LICENSE_FILE } from './fonts';
import { BASEMAP_ATTRIBUTION, BASEMAP_BOUNDS, BASEMAP_MAX_ZOOM, BASEMAP_MIN_ZOOM, BASEMAP_NAME, vectorLayers } from './layers';
import { countryLabels } from './naturalEarth';
import { ARCHIVE_PATH, FONTS_DIR } from './paths';
import { writePmtiles } from './pmtilesWriter';
import { seaLabels } from './seaLabels';

/**
 * The whole archive in memory, with its tile count.
 * @example const { bytes, tileCount } = buildBasemap(); // ≈ 40 000 tiles, under 6 MiB
 */
export function buildBasemap(): { bytes: Uint8Array; tileCount: number } {
  const tiles = cutTiles(countryLabels(), seaLabels()).map((t) => ({ ...t, data: new Uint8Array(gzipSync(t.data, { level: 9 })) }));
  const bytes = writePmtiles(tiles, {
    tileType: TileType.Mvt,
    // Gzipped tiles: measured here, 7.2 MiB of distinct tiles become 4.6 MiB, and browsers unzip for free.
    tileCompression: Compression.Gzip,
    internalCompression: Compression.Gzip,
    bounds: BASEMAP_BOUNDS,
    center: [0, 20, 2],
    metadata: {
      name: BASEMAP_NAME,
      description: 'Land, coast, country borders and names for an offline map, z0–8.',
      attribution: BASEMAP_ATTRIBUTION,
      type: 'baselayer',
      format: 'pbf',
      minzoom: BASEMAP_MIN_ZOOM,
      maxzoom: BASEMAP_MAX_ZOOM,
      scales: ZOOM_BANDS.map((b) => `z${b.minZoom}–${b.maxZoom}: Natural Earth ${b.scale}`),
      vector_layers: vectorLayers(),
    },
  });
  return { bytes, tileCount: tiles.length };
}

function copyFonts() {
  const require = createRequire(import.meta.url);
  const fontsource = dirname(require.resolve('@fontsource/inter/package.json'));
  mkdirSync(FONTS_DIR, { recursive: true });
  for (const font of Object.values(BASEMAP_FONTS)) copyFileSync(join(fontsource, 'files', font.file), join(FONTS_DIR, font.file));
  copyFileSync(join(fontsource, 'LICENSE'), join(FONTS_DIR, FONT_LICENSE_FILE));
}

function main() {
  const started = performance.now();
  const { bytes, tileCount } = buildBasemap();
  writeFileSync(ARCHIVE_PATH, bytes);
  copyFonts();
  const seconds = (performance.now() - started) / 1000;
  const mib = bytes.length / 2 ** 20;
  console.log(`basemap: ${tileCount} tiles, ${bytes.length} bytes (${mib.toFixed(2)} MiB), ${seconds.toFixed(1)} s → ${ARCHIVE_PATH}`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) main();
