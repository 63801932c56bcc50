import { describe, expect, it } from 'vitest';
import { Compression, PMTiles, TileType } from 'pmtiles';
import { BufferSource } from '../../../tiles/bufferSource';
import { writePmtiles, type PmtilesOptions, type TileInput } from '../../../tiles/pmtilesWriter';

// The reference throughout is the npm `pmtiles` reader (the format's own JavaScript implementation):
// whatever the writer produces must read back tile for tile.

const OPTIONS: PmtilesOptions = {
  tileType: TileType.Mvt,
  tileCompression: Compression.None,
  metadata: { name: 'round trip', vector_layers: [{ id: 'land', fields: {} }] },
  bounds: [-180, -85.0511287798, 180, 85.0511287798],
  center: [10.5, -20.25, 3],
};

const bytesOf = (text: string) => new TextEncoder().encode(text);
const textOf = (data: ArrayBuffer) => new TextDecoder().decode(data);

/** A spread of tiles over z0–8: whole zooms 0–3, then a diagonal band of tiles at 4–8. */
function sampleTiles(): TileInput[] {
  const tiles: TileInput[] = [];
  for (let z = 0; z <= 8; z++) {
    const n = 2 ** z;
    for (let x = 0; x < n; x++) {
      for (let y = 0; y < n; y++) {
        if (z > 3 && Math.abs(x - y) > 1) continue;
        tiles.push({ z, x, y, data: bytesOf(`tile ${z}/${x}/${y}`) });
      }
    }
  }
  return tiles;
}

function reader(bytes: Uint8Array) {
  return new PMTiles(new BufferSource(bytes, 'test'));
}

describe('writePmtiles', () => {
  it('writes the v3 header the spec fixes: magic, version 3, root directory right after the 127-byte header', () => {
    const bytes = writePmtiles([{ z: 0, x: 0, y: 0, data: bytesOf('one') }], OPTIONS);
    // PMTiles v3 specification, "Header": bytes 0–6 "PMTiles", byte 7 version, header length 127.
    expect(new TextDecoder().decode(bytes.slice(0, 7))).toBe('PMTiles');
    expect(bytes[7]).toBe(3);
    expect(Number(new DataView(bytes.buffer).getBigUint64(8, true))).toBe(127);
  });

  it('round-trips every tile of several zooms through leaf directories', async () => {
    const tiles = sampleTiles();
    const bytes = writePmtiles(tiles, { ...OPTIONS, leafSize: 16 });
    const archive = reader(bytes);
    const header = await archive.getHeader();
    expect(header.leafDirectoryLength).toBeGreaterThan(0); // the root only points at leaves
    expect(header.numAddressedTiles).toBe(tiles.length);
    expect(header.minZoom).toBe(0);
    expect(header.maxZoom).toBe(8);
    for (const t of tiles) {
      const got = await archive.getZxy(t.z, t.x, t.y);
      expect(got && textOf(got.data)).toBe(`tile ${t.z}/${t.x}/${t.y}`);
    }
    // Tiles never written are absent, not some neighbour's bytes.
    expect(await archive.getZxy(8, 0, 255)).toBeUndefined();
    expect(await archive.getZxy(5, 31, 0)).toBeUndefined();
  });

  it('moves to leaf directories by itself when the root would not fit in the first 16 KiB', async () => {
    // 20 000 tiles scattered over zoom 12 with distinct contents: far more directory than 16 KiB holds.
    // Positions from the "minimal standard" generator (Park & Miller 1988, CACM 31(10)), exact in doubles.
    const tiles: TileInput[] = [];
    let seed = 12345;
    const next = () => (seed = (seed * 48_271) % 2_147_483_647);
    for (let i = 0; i < 20_000; i++) tiles.push({ z: 12, x: next() % 4096, y: next() % 4096, data: bytesOf(`#${i}`) });
    const unique = [...new Map(tiles.map((t) => [`${t.x}/${t.y}`, t])).values()];
    expect(unique.length).toBeGreaterThan(19_000);
    const bytes = writePmtiles(unique, OPTIONS);
    const archive = reader(bytes);
    const header = await archive.getHeader();
    expect(header.rootDirectoryOffset + header.rootDirectoryLength).toBeLessThanOrEqual(16_384);
    expect(header.leafDirectoryLength).toBeGreaterThan(0);
    for (const t of unique.filter((_, i) => i % 97 === 0)) {
      const got = await archive.getZxy(t.z, t.x, t.y);
      expect(got && textOf(got.data)).toBe(textOf(t.data.buffer as ArrayBuffer));
    }
  });

  it('stores repeated contents once and runs of them as one entry', async () => {
    const same = bytesOf('open sea');
    const tiles: TileInput[] = [0, 1, 2, 3].map((i) => ({ z: 1, x: i % 2, y: Math.floor(i / 2), data: same }));
    tiles.push({ z: 0, x: 0, y: 0, data: bytesOf('world') });
    const bytes = writePmtiles(tiles, OPTIONS);
    const archive = reader(bytes);
    const header = await archive.getHeader();
    expect(header.numAddressedTiles).toBe(5);
    expect(header.numTileContents).toBe(2);
    // Zoom-1 tiles have consecutive Hilbert ids 1–4, so they collapse to one run.
    expect(header.numTileEntries).toBe(2);
    for (const [x, y] of [
      [0, 0],
      [1, 0],
      [0, 1],
      [1, 1],
    ])
      expect(textOf((await archive.getZxy(1, x, y))!.data)).toBe('open sea');
    expect(textOf((await archive.getZxy(0, 0, 0))!.data)).toBe('world');
  });

  it('carries the metadata, bounds and centre', async () => {
    const archive = reader(writePmtiles(sampleTiles(), OPTIONS));
    expect(await archive.getMetadata()).toEqual(OPTIONS.metadata);
    const h = await archive.getHeader();
    expect([h.minLon, h.minLat, h.maxLon, h.maxLat]).toEqual([-180, -85.0511288, 180, 85.0511288]); // 1e-7° steps per the spec
    expect([h.centerLon, h.centerLat, h.centerZoom]).toEqual([10.5, -20.25, 3]);
    expect(h.tileType).toBe(TileType.Mvt);
    expect(h.internalCompression).toBe(Compression.Gzip);
  });

  it('gives the same bytes whatever order the tiles come in', () => {
    const tiles = sampleTiles();
    const shuffled = [...tiles].sort((a, b) => ((a.x * 31 + a.y * 17 + a.z) % 13) - ((b.x * 31 + b.y * 17 + b.z) % 13));
    expect(Buffer.from(writePmtiles(shuffled, OPTIONS)).equals(Buffer.from(writePmtiles(tiles, OPTIONS)))).toBe(true);
  });

  it('rejects an empty tile list and a tile given twice', () => {
    expect(() => writePmtiles([], OPTIONS)).toThrow('writePmtiles: no tiles given; an archive needs at least one tile.');
    const t = { z: 3, x: 1, y: 2, data: bytesOf('a') };
    expect(() => writePmtiles([t, { ...t }], OPTIONS)).toThrow('writePmtiles: tile 3/1/2 is given twice.');
  });
});
