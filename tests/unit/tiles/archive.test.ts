import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Compression, PMTiles, TileType } from 'pmtiles';
import { buildBasemap } from '../../../tiles/build';
import { BufferSource } from '../../../tiles/bufferSource';
import { ARCHIVE_PATH } from '../../../tiles/paths';

// The committed tiles/basemap.pmtiles, read with the npm `pmtiles` reader.
const committed = readFileSync(ARCHIVE_PATH);
const archive = new PMTiles(new BufferSource(committed, 'committed'));

describe('tiles/basemap.pmtiles', () => {
  it('holds gzipped vector tiles for z0–8 in under 6 MiB', async () => {
    const h = await archive.getHeader();
    expect([h.minZoom, h.maxZoom]).toEqual([0, 8]);
    expect(h.tileType).toBe(TileType.Mvt);
    expect(h.tileCompression).toBe(Compression.Gzip);
    expect(committed.length).toBeLessThan(6 * 2 ** 20);
    expect(h.numAddressedTiles).toBeGreaterThan(30_000);
    expect(h.numTileContents).toBeLessThan(h.numAddressedTiles); // repeated open-land tiles stored once
  });

  it('declares its layers and the Natural Earth attribution in the metadata', async () => {
    const meta = (await archive.getMetadata()) as { attribution: string; vector_layers: { id: string }[] };
    expect(meta.attribution).toBe('Natural Earth (public domain) via world-atlas');
    expect(meta.vector_layers.map((l) => l.id)).toEqual(['land', 'coast', 'borders', 'country_label', 'sea_label']);
  });

  it('is exactly what the build makes now (reproducible, and not stale)', { timeout: 180_000 }, () => {
    const { bytes } = buildBasemap();
    expect(bytes.length).toBe(committed.length);
    expect(Buffer.from(bytes).equals(committed)).toBe(true);
  });
});
