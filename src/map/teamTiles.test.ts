import { describe, expect, it } from 'vitest';
import { teamTileUrl } from './teamTiles';

describe('teamTileUrl', () => {
  it('builds the team tile template with the WHATWG URL parser agreeing on origin and query', () => {
    const url = teamTileUrl('http://127.0.0.1:8080', 'team 1', 'planned-wells', 4);
    const parsed = new URL(url.replace('{z}/{x}/{y}', '3/2/1'));
    expect(parsed.origin).toBe('http://127.0.0.1:8080');
    expect(parsed.pathname).toBe('/api/teams/team%201/tiles/planned-wells/3/2/1.mvt');
    expect(parsed.searchParams.get('v')).toBe('4');
    expect(() => teamTileUrl('/relative', 't', 'wells', 0)).toThrow(
      'teamTileUrl: origin must look like http://host:port, got "/relative".',
    );
    expect(() => teamTileUrl('http://x', 't', 'wells', -1)).toThrow('teamTileUrl: version must be a whole number ≥ 0, got -1.');
  });
});
