// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import type { Session } from '@shared/schemas/auth';
import { errorReply, installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import WellDetailView from './WellDetailView.vue';

const WELL_ID = '0b3959fc-5dc1-4b11-ac7f-b4dcf22e037e';
const base = `/api/teams/${TEAM_A}/wells/${WELL_ID}`;

const sessionAs = (role: 'geoscientist' | 'viewer'): Session => ({
  user: { id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10', email: 'a@example.org', name: 'A' },
  memberships: [{ teamId: TEAM_A, teamName: 'North Shelf', role }],
});

const well = (version: number, note: string | null = null) => ({
  id: WELL_ID,
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
  pressureCount: 1,
  logCount: 0,
  hasSurvey: false,
  hasLot: true,
  updatedAt: '2025-01-01T00:00:00.000Z',
  surfaceX: -100.629402,
  surfaceY: -32.607932,
  surfaceEpsg: 4326,
  datumKind: 'RT',
  datumElevationM: 26.2,
  groundElevationM: null,
  airGapM: 26.2,
  note,
  version,
  tops: [],
  survey: null,
  createdAt: '2025-01-01T00:00:00.000Z',
});

// A 1.16 sg leak-off test at 1101.18 m TVD: p = ρ·g·TVD with g = 9.80665 m/s² = 12.527 MPa.
const lot = {
  id: 'f1a6f58e-db43-4a94-8248-b9ffb418c710',
  kind: 'lot',
  mdM: 1101.2,
  tvdM: 1101.18,
  valueEntered: 1.16,
  unitEntered: 'sg',
  valueSi: 1160 * 9.80665 * 1101.18,
  emwKgM3: 1160,
  quality: 'good',
  fluid: null,
  observedOn: '2001-09-03',
  source: 'leak-off test below the 20 in shoe',
};

// Replies follow the contract in shared/schemas/wells.ts; PATCH answers 409 `conflict` for a stale version.
describe('WellDetailView', { timeout: 30_000 }, () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  function routes(role: 'geoscientist' | 'viewer', patch: (body: unknown) => Response, current: () => ReturnType<typeof well>) {
    return installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, sessionAs(role)),
      [`GET ${base}`]: () => jsonReply(200, current()),
      [`GET ${base}/pressures`]: () => jsonReply(200, [lot]),
      [`GET ${base}/logs`]: () => jsonReply(200, []),
      [`PATCH ${base}`]: patch,
    });
  }

  it('shows the pressure as entered, in MPa and as EMW, with the caution', async () => {
    routes(
      'viewer',
      () => errorReply(403, 'forbidden', 'no'),
      () => well(3),
    );
    const { wrapper } = await mountInApp(WellDetailView, { props: { wellId: WELL_ID }, path: `/wells/${WELL_ID}` });
    await vi.waitFor(() => expect(wrapper.find('[data-testid="well-pressures"]').exists()).toBe(true));
    await flushPromises();
    const text = wrapper.get('[data-testid="well-pressures"]').text();
    expect(text).toContain('Leak-off test');
    expect(text).toContain('1.16 sg');
    expect(text).toContain('12.53'); // MPa
    expect(wrapper.get('[data-testid="pressure-caution"]').text()).toBe(
      'Predictions and measured values guide decisions; verify with the responsible licensed engineer and local regulations.',
    );
    // Viewers do not get edit controls (shared/auth/permissions.ts: wells.edit is not a viewer grant).
    expect(wrapper.find('[data-testid="well-edit-open"]').exists()).toBe(false);
  });

  it("leads to the well's pressure profile from its header, for viewers too", async () => {
    routes(
      'viewer',
      () => errorReply(403, 'forbidden', 'no'),
      () => well(3),
    );
    const { wrapper, router } = await mountInApp(WellDetailView, { props: { wellId: WELL_ID }, path: `/wells/${WELL_ID}` });
    await vi.waitFor(() => expect(wrapper.find('[data-testid="well-profile-open"]').exists()).toBe(true));
    const button = wrapper.get('[data-testid="well-profile-open"]');
    expect(button.text()).toBe('Pressure profile');
    expect(button.attributes('href')).toBe(`/wells/${WELL_ID}/profile`);
    expect(router.resolve(button.attributes('href')!).name).toBe('well-profile');
  });

  it('tells the editor that someone else saved first, stores nothing, and reloads the current header', async () => {
    let stored = well(3);
    const patches: unknown[] = [];
    routes(
      'geoscientist',
      (body) => {
        patches.push(body);
        return errorReply(409, 'conflict', 'This well was changed by someone else since you opened it.', { currentVersion: 4 });
      },
      () => stored,
    );
    const { wrapper } = await mountInApp(WellDetailView, { props: { wellId: WELL_ID }, path: `/wells/${WELL_ID}` });
    await vi.waitFor(() => expect(wrapper.find('[data-testid="well-edit-open"]').exists()).toBe(true));

    await wrapper.get('[data-testid="well-edit-open"]').trigger('click');
    await wrapper.get('[data-testid="edit-note"] textarea').setValue('My note');
    stored = well(4, 'Their note'); // someone else saves in between
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    expect(patches).toEqual([{ version: 3, note: 'My note' }]);
    expect(wrapper.get('[data-testid="well-stale"]').text()).toContain('Someone saved this well after you opened it');
    expect(wrapper.get('[data-testid="edit-save"]').attributes('disabled')).toBeDefined();

    await wrapper.get('[data-testid="well-reload"]').trigger('click');
    await flushPromises();
    expect(wrapper.find('[data-testid="well-stale"]').exists()).toBe(false);
    expect((wrapper.get('[data-testid="edit-note"] textarea').element as HTMLTextAreaElement).value).toBe('Their note');
  });

  it('shows a name clash (409 at the current version) as the server words it, not as a stale edit', async () => {
    routes(
      'geoscientist',
      () => errorReply(409, 'conflict', 'Another well in this team already has that name or UWI.'),
      () => well(3),
    );
    const { wrapper } = await mountInApp(WellDetailView, { props: { wellId: WELL_ID }, path: `/wells/${WELL_ID}` });
    await vi.waitFor(() => expect(wrapper.find('[data-testid="well-edit-open"]').exists()).toBe(true));
    await wrapper.get('[data-testid="well-edit-open"]').trigger('click');
    await wrapper.get('[data-testid="edit-name"] input').setValue('AVX-09');
    await wrapper.get('form').trigger('submit');
    await flushPromises();
    expect(wrapper.find('[data-testid="well-stale"]').exists()).toBe(false);
    expect(wrapper.get('[data-testid="well-edit-error"]').text()).toBe('Another well in this team already has that name or UWI.');
  });
});
