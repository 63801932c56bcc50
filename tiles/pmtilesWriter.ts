/**
 * A PMTiles v3 writer. Our own because the npm `pmtiles` package only reads archives; this follows the
 * open PMTiles v3 specification (127-byte header, Hilbert tile ids, varint directories, leaf directories
 * when the root would not fit in the first 16 KiB) and borrows the package's own tile-id function.
 */
import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import { Compression, TileType, zxyToTileId } from 'pmtiles';

export interface TileInput {
  z: number;
  x: number;
  y: number;
  data: Uint8Array;
}

export interface PmtilesOptions {
  tileType: TileType;
  /** How the tile bytes given were compressed (the writer stores them as they are). */
  tileCompression: Compression;
  /** Directories and metadata; gzip keeps the root small enough for the 16 KiB first read. */
  internalCompression?: Compression.None | Compression.Gzip;
  metadata: Record<string, unknown>;
  /** [west, south, east, north] in degrees. */
  bounds: [number, number, number, number];
  /** [lon, lat, zoom] the viewer opens at. */
  center: [number, number, number];
  /** Entries per leaf directory; left out, the writer finds one that keeps the root under 16 KiB. */
  leafSize?: number;
}

interface Entry {
  tileId: number;
  offset: number;
  length: number;
  runLength: number;
}

const HEADER_BYTES = 127;
/** Readers fetch the first 16 KiB in one request and expect the header and root directory inside. */
const FIRST_READ_BYTES = 16_384;

/**
 * Builds a whole PMTiles v3 archive in memory. Same tiles in, same bytes out, whatever the input order:
 * tiles are sorted by tile id, identical contents are stored once, and nothing time-dependent is written.
 * @example
 * const bytes = writePmtiles([{ z: 0, x: 0, y: 0, data: mvt }], {
 *   tileType: TileType.Mvt, tileCompression: Compression.None, metadata: { name: 'demo' },
 *   bounds: [-180, -85, 180, 85], center: [0, 0, 0],
 * });
 */
export function writePmtiles(tiles: readonly TileInput[], options: PmtilesOptions): Uint8Array {
  if (tiles.length === 0) throw new Error('writePmtiles: no tiles given; an archive needs at least one tile.');
  const internal = options.internalCompression ?? Compression.Gzip;
  const compress = (bytes: Uint8Array) => (internal === Compression.Gzip ? new Uint8Array(gzipSync(bytes, { level: 9 })) : bytes);

  const sorted = tiles.map((t) => ({ ...t, tileId: zxyToTileId(t.z, t.x, t.y) })).sort((a, b) => a.tileId - b.tileId);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i].tileId === sorted[i - 1].tileId) {
      const t = sorted[i];
      throw new Error(`writePmtiles: tile ${t.z}/${t.x}/${t.y} is given twice.`);
    }
  }

  // Content-addressed tile data: repeated tiles (open land, open sea) share one copy.
  const offsetByHash = new Map<string, number>();
  const chunks: Uint8Array[] = [];
  let dataLength = 0;
  const entries: Entry[] = [];
  let minZoom = Infinity;
  let maxZoom = -Infinity;
  for (const t of sorted) {
    minZoom = Math.min(minZoom, t.z);
    maxZoom = Math.max(maxZoom, t.z);
    const hash = createHash('sha256').update(t.data).digest('hex');
    let offset = offsetByHash.get(hash);
    if (offset === undefined) {
      offset = dataLength;
      offsetByHash.set(hash, offset);
      chunks.push(t.data);
      dataLength += t.data.length;
    }
    const last = entries[entries.length - 1];
    if (last && last.offset === offset && last.tileId + last.runLength === t.tileId) last.runLength++;
    else entries.push({ tileId: t.tileId, offset, length: t.data.length, runLength: 1 });
  }

  const { root, leaves } = buildDirectories(entries, compress, options.leafSize);
  if (HEADER_BYTES + root.length > FIRST_READ_BYTES) {
    throw new Error(
      `writePmtiles: the root directory is ${root.length} bytes and does not fit in the first 16 KiB; use a larger leafSize.`,
    );
  }
  const metadata = compress(new TextEncoder().encode(JSON.stringify(options.metadata)));

  const rootOffset = HEADER_BYTES;
  const metadataOffset = rootOffset + root.length;
  const leavesOffset = metadataOffset + metadata.length;
  const dataOffset = leavesOffset + leaves.length;
  const out = new Uint8Array(dataOffset + dataLength);
  const header = new DataView(out.buffer, 0, HEADER_BYTES);
  out.set(new TextEncoder().encode('PMTiles'), 0);
  header.setUint8(7, 3);
  const u64 = (at: number, v: number) => header.setBigUint64(at, BigInt(v), true);
  u64(8, rootOffset);
  u64(16, root.length);
  u64(24, metadataOffset);
  u64(32, metadata.length);
  u64(40, leavesOffset);
  u64(48, leaves.length);
  u64(56, dataOffset);
  u64(64, dataLength);
  u64(72, sorted.length);
  u64(80, entries.length);
  u64(88, chunks.length);
  header.setUint8(96, 1); // clustered: contents are laid out in tile-id order of first use
  header.setUint8(97, internal);
  header.setUint8(98, options.tileCompression);
  header.setUint8(99, options.tileType);
  header.setUint8(100, minZoom);
  header.setUint8(101, maxZoom);
  const e7 = (at: number, deg: number) => header.setInt32(at, Math.round(deg * 1e7), true);
  const [west, south, east, north] = options.bounds;
  e7(102, west);
  e7(106, south);
  e7(110, east);
  e7(114, north);
  header.setUint8(118, options.center[2]);
  e7(119, options.center[0]);
  e7(123, options.center[1]);

  out.set(root, rootOffset);
  out.set(metadata, metadataOffset);
  out.set(leaves, leavesOffset);
  let at = dataOffset;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

/** One root directory, or a root of pointers (runLength 0) to leaf directories stored back to back. */
function buildDirectories(entries: Entry[], compress: (b: Uint8Array) => Uint8Array, leafSize?: number) {
  const single = compress(serializeDirectory(entries));
  if (leafSize === undefined && HEADER_BYTES + single.length <= FIRST_READ_BYTES) return { root: single, leaves: new Uint8Array(0) };
  let size = leafSize ?? 4096;
  for (;;) {
    const leafParts: Uint8Array[] = [];
    const pointers: Entry[] = [];
    let leavesLength = 0;
    for (let i = 0; i < entries.length; i += size) {
      const leaf = compress(serializeDirectory(entries.slice(i, i + size)));
      pointers.push({ tileId: entries[i].tileId, offset: leavesLength, length: leaf.length, runLength: 0 });
      leafParts.push(leaf);
      leavesLength += leaf.length;
    }
    const root = compress(serializeDirectory(pointers));
    if (leafSize !== undefined || HEADER_BYTES + root.length <= FIRST_READ_BYTES) {
      return { root, leaves: concat(leafParts, leavesLength) };
    }
    size = Math.ceil(size * 1.2); // common practice in PMTiles writers, no source
  }
}

/** Directory encoding of the v3 spec: count, then delta ids, run lengths, lengths, offsets (0 = contiguous). */
function serializeDirectory(entries: Entry[]): Uint8Array {
  const bytes: number[] = [];
  writeVarint(bytes, entries.length);
  let lastId = 0;
  for (const e of entries) {
    writeVarint(bytes, e.tileId - lastId);
    lastId = e.tileId;
  }
  for (const e of entries) writeVarint(bytes, e.runLength);
  for (const e of entries) writeVarint(bytes, e.length);
  entries.forEach((e, i) => {
    const prev = entries[i - 1];
    writeVarint(bytes, i > 0 && e.offset === prev.offset + prev.length ? 0 : e.offset + 1);
  });
  return Uint8Array.from(bytes);
}

/** Unsigned LEB128; arithmetic rather than bit operators because tile ids pass 2^32 above zoom 15. */
function writeVarint(out: number[], value: number) {
  let v = value;
  while (v >= 0x80) {
    out.push((v % 0x80) | 0x80);
    v = Math.floor(v / 0x80);
  }
  out.push(v);
}

function concat(parts: Uint8Array[], length: number): Uint8Array {
  const out = new Uint8Array(length);
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
