// @vitest-environment happy-dom
import { afterEach, describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import OffsetCandidatesTable from './OffsetCandidatesTable.vue';

const cand = (wellId: string, name: string, score: number, topTvdssM: number | null, hasLot: boolean) => ({
  wellId,
  name,
  uwi: null,
  status: 'drilled',
  lon: -101,
  lat: -32.5,
  distanceKm: 3.2,
  azimuthDeg: 45,
  waterDepthM: 100,
  waterDepthDiffM: 12,
  tdTvdM: 3900,
  tdCoverage: 1.05,
  pressureCount: 7,
  logCount: 2,
  hasLot,
  hasSurvey: true,
  topTvdssM,
  inOffsetSet: false,
  score,
});
const A = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const B = '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d';

describe('OffsetCandidatesTable', () => {
  afterEach(() => {
    document.body.innerHTML = '';
  });

  function mountTable(picks: { wellId: string; name: string; reason: string }[]) {
    return mount(OffsetCandidatesTable, {
      props: { candidates: [cand(A, 'NEAR-1', 0.8164, 3120.4, true), cand(B, 'MID-3', 0.61, null, false)], picks, canEdit: true },
      attachTo: document.body,
    });
  }

  it('shows the score, the datum of the TOP, and data chips without error colours', () => {
    const wrapper = mountTable([]);
    const headers = wrapper.findAll('th').map((th) => th.text());
    expect(headers).toContain('#score');
    expect(headers).toContain('TOP (m TVDSS)');
    const rows = wrapper.findAll('[data-testid="offset-row"]');
    expect(rows.map((r) => r.attributes('data-rank'))).toEqual(['1', '2']);
    const cells = rows[0].findAll('td').map((c) => c.text());
    expect(rows.map((r) => r.get('[data-testid="offset-score"]').text())).toEqual(['0.82', '0.61']);
    expect(cells[cells.length - 1]).toBe('3,120');
    expect(
      rows[1]
        .findAll('td')
        .map((c) => c.text())
        .at(-1),
    ).toBe('—');
    expect(rows[0].get('[data-chip="lot"]').text()).toBe('LOT');
    // No reason box until a well is ticked.
    expect(wrapper.find('[data-testid="offset-reason"]').exists()).toBe(false);
  });

  it('gives a ticked well a reason line of its own under its row, and passes typing up', async () => {
    const wrapper = mountTable([{ wellId: B, name: 'MID-3', reason: 'same fan' }]);
    const reasons = wrapper.findAll('[data-testid="offset-reason"]');
    expect(reasons).toHaveLength(1);
    expect(reasons[0].attributes('data-well-id')).toBe(B);
    // Its own table row, right after MID-3's, spanning every column.
    const tr = reasons[0].element.closest('tr')!;
    expect(tr.getAttribute('data-testid')).toBeNull();
    expect((tr.previousElementSibling as HTMLElement).dataset.wellId).toBe(B);
    expect(Number(tr.querySelector('td')!.getAttribute('colspan'))).toBe(
      wrapper.findAll('[data-testid="offset-row"]')[0].findAll('td').length,
    );
    const input = reasons[0].get('input');
    expect((input.element as HTMLInputElement).value).toBe('same fan');
    await input.setValue('same fan, same seal');
    expect(wrapper.emitted('reason')).toEqual([[B, 'same fan, same seal']]);
  });
});
