import { describe, expect, it } from 'vitest';
import { runProgress } from './useSurfaceJob';

// The phases and their order are the server's (server/features/surfaces: surfaces.service.ts, computeSurface.ts).
describe('runProgress', () => {
  it('maps each phase into its share of the whole run', () => {
    expect(runProgress({ phase: 'interpolating', done: 500, total: 1000 })).toEqual({ label: 'Interpolating the grid', percent: 44 });
    expect(runProgress({ phase: 'saving', done: 0, total: 1 }).percent).toBe(95);
    expect(runProgress({ phase: 'finished', done: 0, total: 0 }).percent).toBe(100);
  });

  it('never goes back when the next phase restarts its count', () => {
    const end = runProgress({ phase: 'interpolating', done: 1000, total: 1000 }).percent;
    const next = runProgress({ phase: 'cross-validating', done: 0, total: 1000 }).percent;
    expect(next).toBeGreaterThanOrEqual(end);
  });

  it('shows an unknown phase by name', () => {
    expect(runProgress({ phase: 'warming up', done: 1, total: 2 })).toEqual({ label: 'warming up', percent: 0 });
  });
});
