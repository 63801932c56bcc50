import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { gunzipSync } from 'node:zlib';
import { Compression, PMTiles, SharedPromiseCache, type DecompressFunc, type Header } from 'pmtiles';
import { BufferSource } from '../../../tiles/bufferSource';
import { BASEMAP_ATTRIBUTION, BASEMAP_NAME, vectorLayers } from '../../../tiles/layers';
import { ARCHIVE_PATH } from '../../../tiles/paths';
import { HttpError } from '../../lib/httpError';

export interface BasemapTile {
  /** The tile as stored: gzip when `encoding` says so. */
  bytes: Buffer;
  encoding: 'gzip' | null;
  /** Strong ETag from the stored bytes, so it stays the same across rebuilds that do not change the tile. */
  etag: string;
}

export interface BasemapService {
  header(): Promise<Header>;
  /** The stored tile, or null when the archive holds none there (open sea, beyond max zoom). */
  tile(z: number, x: number, y: number): Promise<BasemapTile | null>;
  /** TileJSON 3.0 for the archive, with the given tile URL template. */
  tileJson(tilesUrl: string): Promise<Record<string, unknown>>;
}

const unzip: DecompressFunc = async (buf, compression) => {
  if (compression === Compression.None) return buf;
  if (compression === Compression.Gzip) return new Uint8Array(gunzipSync(new Uint8Array(buf))).buffer;
  throw new Error(`basemap: compression ${compression} is not supported.`);
};
/** Tiles go out as stored (the browser unzips them); only directories and metadata are unzipped here. */
const keepAsStored: DecompressFunc = async (buf) => buf;

/**
 * Reads the basemap archive once, on first use, and answers tiles from memory (a few MiB).
 * @example
 * const basemap = createBasemapService();
 * const tile = await basemap.tile(0, 0, 0); // { bytes, encoding: 'gzip', etag: '"…"' }
 */
export function createBasemapService(archivePath = ARCHIVE_PATH): BasemapService {
  let opened: Promise<{ reader: PMTiles; header: Header; metadata: Record<string, unknown> }> | undefined;
  const open = () => {
    opened ??= (async () => {
      const bytes = await readFile(archivePath).catch((err: NodeJS.ErrnoException) => {
        opened = undefined; // a later build can still be picked up without a restart
        if (err.code === 'ENOENT') {
          throw new HttpError(503, 'basemap_missing', 'The basemap archive is not built yet: run `npm run tiles:build`.');
        }
        throw err;
      });
      const source = new BufferSource(bytes, archivePath);
      const reader = new PMTiles(source, new SharedPromiseCache(100, false, unzip), keepAsStored);
      const header = await reader.getHeader();
      const metadata = (await new PMTiles(source, new SharedPromiseCache(1, false, unzip), unzip).getMetadata()) as Record<string, unknown>;
      return { reader, header, metadata };
    })();
    return opened;
  };

  return {
    async header() {
      return (await open()).header;
    },
    async tile(z, x, y) {
      const { reader, header } = await open();
      if (z < header.minZoom || z > header.maxZoom) return null;
      const found = await reader.getZxy(z, x, y);
      if (!found || found.data.byteLength === 0) return null;
      const bytes = Buffer.from(found.data);
      const etag = `"${createHash('sha1').update(bytes).digest('base64url').slice(0, 22)}"`;
      return { bytes, encoding: header.tileCompression === Compression.Gzip ? 'gzip' : null, etag };
    },
    async tileJson(tilesUrl) {
      const { header, metadata } = await open();
      return {
        tilejson: '3.0.0',
        name: metadata.name ?? BASEMAP_NAME,
        description: metadata.description,
        attribution: metadata.attribution ?? BASEMAP_ATTRIBUTION,
        scheme: 'xyz',
        tiles: [tilesUrl],
        minzoom: header.minZoom,
        maxzoom: header.maxZoom,
        bounds: [header.minLon, header.minLat, header.maxLon, header.maxLat],
        center: [header.centerLon, header.centerLat, header.centerZoom],
        vector_layers: metadata.vector_layers ?? vectorLayers(),
      };
    },
  };
}
