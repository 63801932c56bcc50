import { describe, expect, it } from 'vitest';
import { wellPatchBody, type WellDetail } from '@shared/schemas/wells';
import { checkPatch, editModelFromWell, hasChanges, patchFromEdit } from './wellEditModel';

const well: WellDetail = {
  id: '0b3959fc-5dc1-4b11-ac7f-b4dcf22e037e',
  name: 'AVX-08',
  uwi: 'AVB-03-0019-00',
  operator: 'Keldrith Offshore (synthetic)',
  lon: -100.629402,
  lat: -32.607932,
  status: 'abandoned',
  offshore: true,
  waterDepthM: 521.4,
  tdMdM: 5640.8,
  tdTvdM: 4594,
  spudDate: '2001-08-14',
  pressureCount: 67,
  logCount: 4,
  hasSurvey: true,
  hasLot: true,
  updatedAt: '2025-01-01T00:00:00.000Z',
  surfaceX: -100.629402,
  surfaceY: -32.607932,
  surfaceEpsg: 4326,
  datumKind: 'RT',
  datumElevationM: 26.2,
  groundElevationM: null,
  airGapM: 26.2,
  note: null,
  version: 3,
  tops: [],
  survey: null,
  createdAt: '2025-01-01T00:00:00.000Z',
};

describe('well header edit', () => {
  it('sends only the version when nothing changed, also when read in feet (no rounding rewrite)', () => {
    for (const unit of ['m', 'ft'] as const) {
      const body = patchFromEdit(well, editModelFromWell(well, unit), unit);
      expect(body).toEqual({ version: 3 });
      expect(hasChanges(body)).toBe(false);
    }
  });

  it('sends changed fields only, depths typed in feet converted to metres', () => {
    const model = { ...editModelFromWell(well, 'ft'), status: 'suspended' as const, waterDepth: 1000, operator: '  ' };
    const body = patchFromEdit(well, model, 'ft');
    // 1000 ft × 0.3048 m/ft = 304.8 m (international foot, exact).
    expect(body).toEqual({ version: 3, status: 'suspended', waterDepthM: expect.closeTo(304.8, 9), operator: null });
    expect(wellPatchBody.safeParse(body).success).toBe(true);
  });

  it('clears nullable depths but leaves the datum elevation when it is emptied', () => {
    const model = { ...editModelFromWell(well, 'm'), airGap: null, datumElevation: null };
    expect(patchFromEdit(well, model, 'm')).toEqual({ version: 3, airGapM: null });
  });

  it('checks the body with the shared contract, keyed by form field, limits in the reader unit', () => {
    // wellPatchBody: name 1–120 characters, water depth 0–4000 m.
    expect(checkPatch({ version: 3, name: '', waterDepthM: 5000 }, 'm')).toEqual({
      name: 'is required',
      waterDepth: 'must be at most 4000 m',
    });
    // 4000 m / 0.3048 = 13,123.4 ft.
    expect(checkPatch({ version: 3, waterDepthM: -1 }, 'ft')).toEqual({ waterDepth: 'must be at least 0 ft (0 m)' });
    expect(checkPatch({ version: 3, waterDepthM: 4001 }, 'ft').waterDepth).toBe('must be at most 13,123.4 ft (4000 m)');
    expect(checkPatch({ version: 3, name: 'AVX-08b' }, 'm')).toEqual({});
  });
});
