import { describe, expect, it } from 'vitest';
import { surfaceRequestBody } from '@shared/schemas/surfaces';
import { DEFAULT_RUN_FORM, toSurfaceRequest } from './surfaceRunModel';

const PLANNED = '11111111-1111-4111-8111-111111111111';

describe('toSurfaceRequest', () => {
  it('builds a kriging request the contract accepts, fitting the variogram by default', () => {
    const body = toSurfaceRequest(DEFAULT_RUN_FORM, 'm');
    const parsed = surfaceRequestBody.parse(body);
    expect(parsed.wells).toEqual({ from: 'prospect', bufferKm: 30 });
    expect(parsed.method).toEqual({ kind: 'kriging', model: 'spherical', variogram: null, maxNeighbours: 16 });
    expect(parsed.contourIntervalM).toBe(50);
    expect('name' in body).toBe(false);
  });

  it('converts feet to metres with the international foot (0.3048 m exactly, NIST SP 811 B.9)', () => {
    const body = toSurfaceRequest({ ...DEFAULT_RUN_FORM, contourInterval: 100, variogramByHand: true, nugget: 100, sill: 10_000, rangeKm: 12 }, 'ft');
    expect(body.contourIntervalM).toBeCloseTo(30.48, 12);
    // A variance carries the square of the length unit: 1 ft² = 0.09290304 m².
    expect(body.method).toMatchObject({ kind: 'kriging', variogram: { model: 'spherical', range: 12_000 } });
    const v = (body.method as { variogram: { nugget: number; sill: number } }).variogram;
    expect(v.nugget).toBeCloseTo(9.290304, 10);
    expect(v.sill).toBeCloseTo(929.0304, 8);
    expect(surfaceRequestBody.safeParse(body).success).toBe(true);
  });

  it('uses a planned well’s offset set and inverse distance when asked', () => {
    const body = toSurfaceRequest({ ...DEFAULT_RUN_FORM, wellSource: 'offset-set', plannedWellId: PLANNED, method: 'idw', power: 3, name: '  IDW check ' }, 'm');
    expect(body).toMatchObject({ name: 'IDW check', wells: { from: 'offset-set', plannedWellId: PLANNED }, method: { kind: 'idw', power: 3 } });
    expect(surfaceRequestBody.safeParse(body).success).toBe(true);
  });

  it('asks for the planned well before using an offset set', () => {
    expect(() => toSurfaceRequest({ ...DEFAULT_RUN_FORM, wellSource: 'offset-set' }, 'm')).toThrow('Choose the planned well whose offset set to use.');
  });
});
