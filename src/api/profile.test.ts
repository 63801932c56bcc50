// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorReply, installFakeServer, TEAM_A } from '@/testing/fakeServer';
import { currentInterpretation, isStaleVersion, saveInterpretation } from './profile';

const WELL = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const base = `/api/teams/${TEAM_A}/wells/${WELL}/interpretations`;

// Contract: GET …/interpretations/current → 404 not_found when none; POST → 409 conflict on a stale baseVersion.
describe('interpretation API', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('reads "no accepted interpretation" as null', async () => {
    installFakeServer({
      [`GET ${base}/current`]: () => errorReply(404, 'not_found', 'An accepted interpretation of this well was not found'),
    });
    expect(await currentInterpretation(TEAM_A, WELL)).toBeNull();
  });

  it('passes other failures on, and marks a 409 as a stale version', async () => {
    installFakeServer({
      [`GET ${base}/current`]: () => errorReply(500, 'internal', 'boom'),
      [`POST ${base}`]: () => errorReply(409, 'conflict', 'Someone saved a newer interpretation', { currentVersion: 4 }),
    });
    await expect(currentInterpretation(TEAM_A, WELL)).rejects.toMatchObject({ status: 500 });
    const err = await saveInterpretation(TEAM_A, WELL, {
      normalDensityKgM3: 1030,
      trend: null,
      pore: null,
      fracture: null,
      top: null,
      baseVersion: 3,
      status: 'accepted',
    }).catch((e) => e);
    expect(isStaleVersion(err)).toBe(true);
  });
});
