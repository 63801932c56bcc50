// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick, ref } from 'vue';
import type { Interpretation } from '@shared/schemas/interpretations';
import { errorReply, installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { defaultContent, savedByText, useProfileEditor } from './useProfileEditor';

const WELL = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const path = `/api/teams/${TEAM_A}/wells/${WELL}/interpretations`;

function version(v: number, overrides: Partial<Interpretation> = {}): Interpretation {
  return {
    ...defaultContent(),
    id: `0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a${String(10 + v)}`,
    wellId: WELL,
    version: v,
    status: 'accepted',
    note: null,
    createdBy: null,
    createdByName: 'Tomas',
    createdAt: '2026-01-02T10:00:00Z',
    restoredFrom: null,
    ...overrides,
  };
}

// Contract: POST /wells/:id/interpretations {content, baseVersion, status, note} → 201 Interpretation;
// 409 `conflict` when baseVersion is not the newest.
describe('useProfileEditor', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('opens the newest version and sends it as baseVersion with the edited content', async () => {
    const seen: unknown[] = [];
    const v2 = version(2, { top: { tvdM: 2500, method: 'auto', confidence: 'high', comment: null, marginKgM3: 36, minThicknessM: 50 } });
    const versions = ref<Interpretation[]>([v2, version(1)]);
    installFakeServer({
      [`POST ${path}`]: (body) => {
        seen.push(body);
        return jsonReply(201, version(3, { ...(body as object), createdByName: 'Tomas' } as Partial<Interpretation>));
      },
      [`GET ${path}`]: () => jsonReply(200, [version(3), v2, version(1)]),
    });
    const editor = useProfileEditor(ref(TEAM_A), ref(WELL), versions, async () => {
      versions.value = [version(3), v2, version(1)];
      return versions.value;
    });
    expect(editor.baseVersion.value).toBe(2);
    expect(editor.content.value.top?.tvdM).toBe(2500);
    expect(editor.dirty.value).toBe(false);
    editor.content.value.top = { ...editor.content.value.top!, tvdM: 2600, method: 'manual' };
    expect(editor.dirty.value).toBe(true);
    await editor.save({ status: 'accepted', note: 'moved' });
    expect(seen[0]).toMatchObject({ baseVersion: 2, status: 'accepted', note: 'moved', top: { tvdM: 2600, method: 'manual' } });
    expect(editor.saveState.value).toBe('saved');
    expect(editor.baseVersion.value).toBe(3);
    expect(editor.dirty.value).toBe(false);
  });

  it('a 409 conflict becomes the stale state and nothing is marked saved', async () => {
    const versions = ref<Interpretation[]>([version(1)]);
    installFakeServer({
      [`POST ${path}`]: () => errorReply(409, 'conflict', 'Someone saved a newer interpretation', { currentVersion: 2 }),
    });
    const editor = useProfileEditor(ref(TEAM_A), ref(WELL), versions, async () => versions.value);
    editor.content.value.normalDensityKgM3 = 1040;
    await editor.save({ status: 'draft', note: null });
    expect(editor.saveState.value).toBe('stale');
    expect(editor.dirty.value).toBe(true);
  });

  it('restores through the restore endpoint with the newest version as base', async () => {
    const seen: unknown[] = [];
    const versions = ref<Interpretation[]>([version(2), version(1)]);
    installFakeServer({
      [`POST ${path}/1/restore`]: (body) => {
        seen.push(body);
        return jsonReply(201, version(3, { restoredFrom: 1 }));
      },
    });
    const editor = useProfileEditor(ref(TEAM_A), ref(WELL), versions, async () => {
      versions.value = [version(3, { restoredFrom: 1 }), ...versions.value];
      return versions.value;
    });
    await editor.restore(1);
    await nextTick();
    expect(seen).toEqual([{ baseVersion: 2 }]);
    expect(editor.opened.value?.restoredFrom).toBe(1);
  });

  it('a well with no interpretation starts from the published defaults (Eaton exponent 3) with base null', () => {
    const editor = useProfileEditor(ref(TEAM_A), ref(WELL), ref([]), async () => []);
    expect(editor.baseVersion.value).toBeNull();
    // Eaton 1975, SPE 5544: exponent 3 on sonic; the 20 m running median is common practice, no source.
    expect(editor.content.value.pore).toEqual({ method: 'eaton-sonic', exponent: 3, smoothingM: 20 });
  });
});

describe('who saved a version', () => {
  it('names the author when recorded', () => {
    expect(savedByText(version(3), 'UTC')).toBe('saved by Tomas, 2 Jan 2026, 10:00 (v3)');
  });
  it('says the author is not recorded, with the note, instead of "someone"', () => {
    const seeded = version(1, { createdByName: null, note: 'Synthetic demo: automatic pick' });
    expect(savedByText(seeded, 'UTC')).toBe('saved in v1 (Synthetic demo: automatic pick), 2 Jan 2026, 10:00; author not recorded');
    expect(savedByText({ ...seeded, note: null }, 'UTC')).toBe('saved in v1, 2 Jan 2026, 10:00; author not recorded');
  });
});
