// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import type { ImportCommit } from '@shared/schemas/imports';
import { installFakeServer, jsonReply, TEAM_A, twoTeamSession } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import ImportOutcomeCard from './ImportOutcomeCard.vue';

const WELL = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const lasCommit = (well: { id: string; name: string; uwi: null } | null, outcomeWellId: string | undefined): ImportCommit => ({
  kind: 'las',
  fileName: 'osprey.las',
  sizeBytes: 100,
  sha256: 'x',
  duplicateOf: null,
  problems: [],
  warnings: [],
  notes: [],
  counts: { records: 1, invalid: 0, valid: 1 },
  invalidLines: [],
  dryRun: false,
  skipped: false,
  las: {
    plan: {
      well,
      wellLabel: 'OSPREY-9',
      matchedBy: well ? 'name' : null,
      createWell: well ? null : { name: 'OSPREY-9', uwi: null, lon: -101.2, lat: -32.6, locationFrom: 'LATI/LONG' },
      indexUnit: 'M',
      topMdM: 500,
      baseMdM: 900,
      curves: [],
    },
    version: 2,
    wrap: 'NO',
  },
  outcome: { uploadId: 'u', created: 4, skippedLines: [], wellId: outcomeWellId },
});

describe('ImportOutcomeCard', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('links to the well a LAS import created from the file, and to its profile', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const { wrapper } = await mountInApp(ImportOutcomeCard, {
      props: { result: lasCommit(null, WELL), error: null, teamId: TEAM_A, previewRows: [] },
      path: '/import',
    });
    await flushPromises();
    const link = wrapper.get('[data-testid="import-las-well"]');
    expect(link.text()).toBe('OSPREY-9');
    expect(link.attributes('href')).toBe(`/wells/${WELL}`);
    expect(wrapper.find(`a[href="/wells/${WELL}/profile"]`).exists()).toBe(true);
  });

  it('offers no link when the reply does not say which well was created', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const { wrapper } = await mountInApp(ImportOutcomeCard, {
      props: { result: lasCommit(null, undefined), error: null, teamId: TEAM_A, previewRows: [] },
      path: '/import',
    });
    await flushPromises();
    expect(wrapper.find('[data-testid="import-las-well"]').exists()).toBe(false);
  });
});
