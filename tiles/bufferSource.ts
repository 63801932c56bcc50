import type { RangeResponse, Source } from 'pmtiles';

/**
 * A PMTiles `Source` over bytes already in memory: the basemap is a few MiB, so the server reads it once
 * and answers every range from RAM instead of the file system.
 * @example
 * const archive = new PMTiles(new BufferSource(readFileSync('tiles/basemap.pmtiles'), 'basemap'));
 * const tile = await archive.getZxy(0, 0, 0);
 */
export class BufferSource implements Source {
  constructor(
    private readonly bytes: Uint8Array,
    private readonly key = 'memory',
  ) {}

  getKey(): string {
    return this.key;
  }

  async getBytes(offset: number, length: number): Promise<RangeResponse> {
    const start = this.bytes.byteOffset + offset;
    // slice copies: the reader may keep or transfer what it gets, and must not see the rest of the archive.
    const end = Math.min(start + length, this.bytes.byteOffset + this.bytes.byteLength);
    return { data: this.bytes.buffer.slice(start, end) as ArrayBuffer };
  }
}
