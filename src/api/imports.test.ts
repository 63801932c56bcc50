import { afterEach, describe, expect, it, vi } from 'vitest';
import { ImportRejectedError, importError, importFormEntries, previewImport, startImportJob } from './imports';

// Multipart bodies are encoded and decoded by Node's WHATWG fetch implementation (undici's FormData,
// Request.formData()), the same encoding the browser sends and multer reads on the server.
async function sentForm(call: unknown[]): Promise<FormData> {
  const [url, init] = call as [string, RequestInit];
  return new Request(`http://localhost${url}`, init).formData();
}

const previewReply = {
  dryRun: true,
  kind: 'wells',
  fileName: 'wells.csv',
  sizeBytes: 40,
  sha256: 'ab',
  duplicateOf: null,
  problems: [{ line: 3, column: 'Longitude', message: "'abc' is not a number" }],
  warnings: [],
  notes: [],
  counts: { records: 2, invalid: 1, valid: 1, create: 1, update: 0 },
  invalidLines: [3],
  csv: { delimiter: ',', decimalComma: false, encoding: 'utf-8', columns: [{ name: 'Longitude', field: 'x' }], units: {} },
  preview: [{ line: 2, name: 'A-1', action: 'create' }],
};

describe('importFormEntries', () => {
  it('sends a preview as dryRun with mapping and units as JSON text', () => {
    const entries = importFormEntries(
      { kind: 'wells', mapping: { Easting: 'x', Junk: null }, units: { waterDepth: 'ft' }, epsg: 32631 },
      'preview',
    );
    expect(entries).toEqual([
      ['kind', 'wells'],
      ['mapping', '{"Easting":"x","Junk":null}'],
      ['units', '{"waterDepth":"ft"}'],
      ['epsg', '32631'],
      ['dryRun', 'true'],
    ]);
  });

  it('sends a commit as a job, with the skip and duplicate choices, and leaves the default EPSG out', () => {
    const entries = importFormEntries({ kind: 'las', wellId: 'w1', epsg: 4326, skipInvalid: true, onDuplicate: 'update' }, 'job');
    expect(entries).toEqual([
      ['kind', 'las'],
      ['wellId', 'w1'],
      ['async', 'true'],
      ['skipInvalid', 'true'],
      ['onDuplicate', 'update'],
    ]);
  });
});

describe('previewImport / startImportJob', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('posts the file and the fields as multipart, with the session cookie, and returns the checked preview', async () => {
    const fetchMock = vi.fn(async () => Response.json(previewReply));
    vi.stubGlobal('fetch', fetchMock);
    const file = new File(['Longitude\n1\nabc\n'], 'wells.csv', { type: 'text/csv' });

    const preview = await previewImport('t1', { kind: 'wells' }, file);

    expect(preview.counts.valid).toBe(1);
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/teams/t1/imports');
    expect(init.credentials).toBe('same-origin');
    const form = await sentForm(fetchMock.mock.calls[0]);
    expect(form.get('kind')).toBe('wells');
    expect(form.get('dryRun')).toBe('true');
    const sent = form.get('file') as File;
    expect(sent.name).toBe('wells.csv');
    expect(await sent.text()).toBe('Longitude\n1\nabc\n');
  });

  it('keeps the problems of a 422 and the earlier upload of a 409, which field-issue parsing would drop', async () => {
    const problems = [{ line: 3, column: 'Longitude', message: "'abc' is not a number" }];
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        Response.json(
          { error: { code: 'import_has_problems', message: 'wells.csv: 1 problem(s) found; nothing was imported.', details: problems } },
          { status: 422 },
        ),
      ),
    );
    const error = await startImportJob('t1', { kind: 'wells' }, new File(['x'], 'wells.csv')).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ImportRejectedError);
    expect((error as ImportRejectedError).status).toBe(422);
    expect((error as ImportRejectedError).problems).toEqual(problems);
    expect((error as ImportRejectedError).message).toBe('wells.csv: 1 problem(s) found; nothing was imported.');

    const duplicateOf = { uploadId: 'u1', fileName: 'wells.csv', createdAt: '2025-01-02T03:04:05.000Z' };
    const conflict = importError(409, 'conflict', 'wells.csv was imported before', { duplicateOf });
    expect(conflict.duplicateOf).toEqual(duplicateOf);
    expect(conflict.problems).toEqual([]);
  });

  it('says plainly when the server cannot be reached or the reply is not JSON', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    );
    await expect(previewImport('t1', { kind: 'wells' }, new File(['x'], 'a.csv'))).rejects.toMatchObject({
      status: 0,
      code: 'network_error',
    });
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response('<html>Request Entity Too Large</html>', { status: 413 })),
    );
    await expect(previewImport('t1', { kind: 'wells' }, new File(['x'], 'a.csv'))).rejects.toMatchObject({
      status: 413,
      message: 'The file is too large to import.',
    });
  });
});
