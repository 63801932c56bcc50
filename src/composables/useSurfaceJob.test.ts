import { describe, expect, it } from 'vitest';
import { runProgress } from './useSurfaceJob';

// The phases and their order are the server's (shared/schemas/jobs.ts SURFACE_JOB_PHASES).
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

  it('places the at-depth runs’ profile building between gathering the wells and interpolating', () => {
    expect(runProgress({ phase: 'building well profiles', done: 5, total: 10 })).toEqual({ label: 'Building well profiles', percent: 6 });
    expect(runProgress({ phase: 'gathering wells', done: 1, total: 1 }).percent).toBe(
      runProgress({ phase: 'building well profiles', done: 0, total: 1 }).percent,
    );
  });

  it('labels a phase outside a surface run but gives it no share', () => {
    expect(runProgress({ phase: 'failed', done: 0, total: 0 })).toEqual({ label: 'Failed', percent: 0 });
  });
});
