import { afterEach, describe, expect, it, vi } from 'vitest';
import { effectScope, ref } from 'vue';
import { parseCsv, suggestColumnMatches } from '@shared/formats/csv';
import { IMPORT_FIELDS } from '@shared/imports/fields';
import { useImportSession } from './useImportSession';

// A stand-in for POST /imports that answers the way the server does: it suggests the mapping with the
// shared suggestColumnMatches unless one is sent, and echoes the mapping it used in csv.columns.
// Multipart bodies are decoded with Node's WHATWG Request.formData() (undici), as multer would read them.
const TEAM = 't1';

function previewOf(text: string, fileName: string, mapping?: Record<string, string | null>) {
  const csv = parseCsv(text);
  const matches = suggestColumnMatches(csv.header, IMPORT_FIELDS.wells);
  const used = mapping ?? Object.fromEntries(matches.map((m) => [m.column, m.field]));
  return {
    dryRun: true,
    kind: 'wells',
    fileName,
    sizeBytes: text.length,
    sha256: 'x',
    duplicateOf: null,
    problems: [],
    warnings: [],
    notes: [],
    counts: { records: csv.rows.length, invalid: 0, valid: csv.rows.length, create: csv.rows.length, update: 0 },
    invalidLines: [],
    csv: {
      delimiter: ',',
      decimalComma: false,
      encoding: 'utf-8',
      columns: csv.header.map((name) => ({ name, field: used[name] ?? null })),
      units: { waterDepth: 'm' },
    },
    preview: csv.rows.map((r) => ({ line: r.line, name: r.cells[0], action: 'create' })),
  };
}

interface Sent {
  fields: Record<string, string>;
  fileName: string;
}

function fakeImportServer(options: { delayFor?: (fileName: string) => number } = {}) {
  const sent: Sent[] = [];
  let polls = 0;
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = String(input);
    if (init?.method === 'POST' && url === `/api/teams/${TEAM}/imports`) {
      const form = await new Request(`http://localhost${url}`, init).formData();
      const file = form.get('file') as File;
      const fields: Record<string, string> = {};
      form.forEach((v, k) => {
        if (typeof v === 'string') fields[k] = v;
      });
      sent.push({ fields, fileName: file.name });
      await new Promise((r) => setTimeout(r, options.delayFor?.(file.name) ?? 0));
      if (fields.async === 'true') return Response.json({ jobId: 'job-1' }, { status: 202 });
      const mapping = fields.mapping ? (JSON.parse(fields.mapping) as Record<string, string | null>) : undefined;
      return Response.json(previewOf(await file.text(), file.name, mapping));
    }
    if (url === `/api/teams/${TEAM}/jobs/job-1`) {
      polls += 1;
      if (polls < 2) return Response.json({ id: 'job-1', kind: 'import', state: 'running', phase: 'writing new wells', done: 1, total: 2 });
      const result = {
        ...previewOf('name,lon,lat\nA-1,1,2\n', 'w.csv'),
        dryRun: false,
        skipped: false,
        outcome: { uploadId: 'u1', created: 1, updated: 0, skippedLines: [] },
      };
      return Response.json({ id: 'job-1', kind: 'import', state: 'done', phase: 'finished', done: 2, total: 2, result });
    }
    return Response.json({ error: { code: 'not_found', message: `no route ${url}` } }, { status: 404 });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { sent };
}

function sessionInScope() {
  const scope = effectScope();
  const onCommitted = vi.fn();
  const session = scope.run(() => useImportSession(ref(TEAM), { onCommitted }))!;
  return { session, scope, onCommitted };
}

describe('useImportSession', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('previews a dropped file with the server’s suggestions, then sends the edited mapping', async () => {
    const server = fakeImportServer();
    const { session, scope } = sessionInScope();
    await session.chooseFile(new File(['Well Name,Longitude,Latitude,Remark\nA-1,1,2,x\n'], 'w.csv'));

    expect(server.sent[0].fields).toEqual({ kind: 'wells', dryRun: 'true' });
    expect(session.mapping.value).toEqual({ 'Well Name': 'name', Longitude: 'x', Latitude: 'y', Remark: null });

    session.setColumnField('Remark', 'note');
    session.setEpsg(32631);
    await vi.waitFor(() => expect(server.sent).toHaveLength(2));
    expect(JSON.parse(server.sent[1].fields.mapping)).toEqual({ 'Well Name': 'name', Longitude: 'x', Latitude: 'y', Remark: 'note' });
    expect(server.sent[1].fields.epsg).toBe('32631');
    scope.stop();
  });

  it('does not take the suggestions of the previous file’s preview when it answers after the next file was chosen', async () => {
    const server = fakeImportServer({ delayFor: (name) => (name === 'old.csv' ? 20 : 120) });
    const { session, scope } = sessionInScope();
    const first = session.chooseFile(new File(['Name,Lon,Lat\nOLD-1,1,2\n'], 'old.csv'));
    await session.chooseFile(new File(['Well Name,Longitude,Latitude\nNEW-1,1,2\n'], 'new.csv'));
    await first;
    expect(server.sent.map((s) => s.fileName)).toEqual(['old.csv', 'new.csv']);
    expect(session.preview.value?.fileName).toBe('new.csv');
    expect(session.mapping.value).toEqual({ 'Well Name': 'name', Longitude: 'x', Latitude: 'y' });
    scope.stop();
  });

  it('commits as a job, follows its progress to the outcome and tells the page', async () => {
    const server = fakeImportServer();
    const { session, scope, onCommitted } = sessionInScope();
    await session.chooseFile(new File(['name,lon,lat\nA-1,1,2\n'], 'w.csv'));
    expect(session.blocker.value).toBeNull();

    await session.commit();

    expect(server.sent[1].fields).toMatchObject({ kind: 'wells', async: 'true' });
    expect(server.sent[1].fields.dryRun).toBeUndefined();
    expect(session.progress.value.state).toBe('done');
    expect(session.progress.value.result?.outcome?.created).toBe(1);
    expect(onCommitted).toHaveBeenCalledOnce();
    scope.stop();
  });
});
