import { describe, expect, it } from 'vitest';
import { surfaceRequestBody } from '@shared/schemas/surfaces';
import { DEFAULT_RUN_FORM, toSurfaceRequest } from './surfaceRunModel';

const PLANNED = '11111111-1111-4111-8111-111111111111';

describe('toSurfaceRequest', () => {
  it('builds a kriging request the contract accepts, fitting the variogram by default', () => {
    const body = toSurfaceRequest(DEFAULT_RUN_FORM, 'm');
    const parsed = surfaceRequestBody.parse(body);
    expect(parsed.wells).toEqual({ from: 'prospect', bufferKm: 30 });
    expect(parsed.method).toEqual({ kind: 'kriging', model: 'spherical', variogram: null, maxNeighbours: null, trend: 'none' });
    expect(parsed.contourLabelUnit).toBe('m');
    expect(parsed.contourIntervalM).toBe(50);
    expect('name' in body).toBe(false);
  });

  it('converts feet to metres with the international foot (0.3048 m exactly, NIST SP 811 B.9)', () => {
    const body = toSurfaceRequest(
      { ...DEFAULT_RUN_FORM, contourInterval: 100, variogramByHand: true, nugget: 100, sill: 10_000, rangeKm: 12 },
      'ft',
    );
    expect(body.contourIntervalM).toBeCloseTo(30.48, 12);
    // A variance carries the square of the length unit: 1 ft² = 0.09290304 m².
    expect(body.method).toMatchObject({ kind: 'kriging', variogram: { model: 'spherical', range: 12_000 } });
    const v = (body.method as { variogram: { nugget: number; sill: number } }).variogram;
    expect(v.nugget).toBeCloseTo(9.290304, 10);
    expect(v.sill).toBeCloseTo(929.0304, 8);
    expect(surfaceRequestBody.safeParse(body).success).toBe(true);
  });

  it('asks for regression kriging when the trend switch is on', () => {
    const parsed = surfaceRequestBody.parse(toSurfaceRequest({ ...DEFAULT_RUN_FORM, removeTrend: true }, 'm'));
    expect(parsed.method).toMatchObject({ kind: 'kriging', trend: 'planar' });
  });

  it('uses a planned well’s offset set and inverse distance when asked', () => {
    const body = toSurfaceRequest(
      { ...DEFAULT_RUN_FORM, wellSource: 'offset-set', plannedWellId: PLANNED, method: 'idw', power: 3, name: '  IDW check ' },
      'm',
    );
    expect(body).toMatchObject({
      name: 'IDW check',
      wells: { from: 'offset-set', plannedWellId: PLANNED },
      method: { kind: 'idw', power: 3 },
    });
    expect(surfaceRequestBody.safeParse(body).success).toBe(true);
  });

  it('asks for the planned well before using an offset set', () => {
    expect(() => toSurfaceRequest({ ...DEFAULT_RUN_FORM, wellSource: 'offset-set' }, 'm')).toThrow(
      'Choose the planned well whose offset set to use.',
    );
  });
});

describe('toSurfaceRequest for quantities at a depth', () => {
  it('sends the depth in metres and the contour interval and variogram in the quantity’s SI unit', () => {
    const form = {
      ...DEFAULT_RUN_FORM,
      quantity: 'emw_at_depth' as const,
      depth: 10_000,
      contourInterval: 0.1,
      variogramByHand: true,
      nugget: 0,
      sill: 1,
      rangeKm: 10,
    };
    const body = toSurfaceRequest(form, 'ft', { pressure: 'MPa', emw: 'ppg' });
    // 10,000 ft = 3048 m (international foot, NIST SP 811 B.9).
    expect(body.depthTvdssM).toBeCloseTo(3048, 9);
    // 1 ppg = 119.826427 kg/m³ (0.45359237 kg per 231 in³; NIST SP 811 B.9).
    expect(body.contourIntervalKgM3).toBeCloseTo(11.9826427, 6);
    expect((body.method as { variogram: { sill: number } }).variogram.sill).toBeCloseTo(119.826427 ** 2, 3);
    expect(surfaceRequestBody.safeParse(body).success).toBe(true);
    const op = toSurfaceRequest({ ...DEFAULT_RUN_FORM, quantity: 'overpressure_at_depth', depth: 3000, contourInterval: 100 }, 'm', {
      pressure: 'psi',
      emw: 'sg',
    });
    // 1 psi = 6894.757 Pa (NIST SP 811 B.9).
    expect(op.contourIntervalPa).toBeCloseTo(689_475.7, 0);
    expect(op.depthTvdssM).toBe(3000);
  });

  it('asks for the depth before running an at-depth quantity', () => {
    expect(() => toSurfaceRequest({ ...DEFAULT_RUN_FORM, quantity: 'overpressure_at_depth' }, 'm')).toThrow(
      'Give the depth below sea level to read the pore pressure at.',
    );
  });
});
