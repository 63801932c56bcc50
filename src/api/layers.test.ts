import { describe, expect, it, vi } from 'vitest';
import { ApiClientError } from './client';
import { uploadReferenceLayer } from './layers';

const TEAM = '5d2c1a9b-7f1e-4c3a-8b2d-1e0f9a8b7c6d';
const layer = {
  id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10',
  name: 'Blocks',
  kind: 'lease_blocks',
  color: '#A0782C',
  featureCount: 2,
  geometryTypes: ['POLYGON'],
  bbox: [-101, -32.6, -100.8, -32.5],
  createdAt: '2026-01-01T00:00:00.000Z',
};
const file = new File(['{"type":"FeatureCollection","features":[]}'], 'blocks.geojson', { type: 'application/geo+json' });
const fields = { name: 'Blocks', kind: 'lease_blocks' as const, color: '#A0782C' };

// Multipart bodies are encoded and decoded by Node's WHATWG fetch implementation (undici's FormData,
// Request.formData()), the same encoding the browser sends and multer reads on the server.
async function sentForm(call: unknown[]): Promise<FormData> {
  const [url, init] = call as [string, RequestInit];
  return new Request(`http://localhost${url}`, init).formData();
}

describe('uploadReferenceLayer', () => {
  it('posts the fields and the file as multipart to the team layers route', async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => Response.json(layer, { status: 201 }));
    const created = await uploadReferenceLayer(TEAM, fields, file, fetchImpl);
    expect(created.id).toBe(layer.id);
    expect(fetchImpl.mock.calls[0][0]).toBe(`/api/teams/${TEAM}/layers`);
    const form = await sentForm(fetchImpl.mock.calls[0]);
    expect([form.get('name'), form.get('kind'), form.get('color')]).toEqual(['Blocks', 'lease_blocks', '#A0782C']);
    expect((form.get('file') as File).name).toBe('blocks.geojson');
  });

  it("passes the server's words on: the feature that is wrong, the size limit, the field", async () => {
    const reply = (status: number, body: unknown) => vi.fn<typeof fetch>(async () => Response.json(body, { status }));
    const invalid = uploadReferenceLayer(
      TEAM,
      fields,
      file,
      reply(400, {
        error: {
          code: 'invalid_layer',
          message: 'Feature 2 is not a valid geometry: Self-intersection[-100.95 -32.45].',
          details: { feature: 2 },
        },
      }),
    );
    await expect(invalid).rejects.toMatchObject({
      status: 400,
      code: 'invalid_layer',
      message: 'Feature 2 is not a valid geometry: Self-intersection[-100.95 -32.45].',
    });
    const large = uploadReferenceLayer(
      TEAM,
      fields,
      file,
      reply(413, { error: { code: 'file_too_large', message: 'The layer file is larger than the 20 MB limit.' } }),
    );
    await expect(large).rejects.toMatchObject({ status: 413, message: 'The layer file is larger than the 20 MB limit.' });
    const field = uploadReferenceLayer(
      TEAM,
      fields,
      file,
      reply(400, {
        error: {
          code: 'validation_failed',
          message: 'Invalid body',
          details: [{ path: 'color', message: 'must be a colour like #3a7bd5' }],
        },
      }),
    );
    const err = await field.catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiClientError);
    expect((err as ApiClientError).message).toBe('color: must be a colour like #3a7bd5');
    expect((err as ApiClientError).fieldMessage('color')).toBe('must be a colour like #3a7bd5');
  });

  it('explains a bare 413 from a proxy and a dropped connection', async () => {
    const proxy = vi.fn<typeof fetch>(async () => new Response('<html>413 Request Entity Too Large</html>', { status: 413 }));
    await expect(uploadReferenceLayer(TEAM, fields, file, proxy)).rejects.toMatchObject({
      status: 413,
      message: 'The layer file is too large for the server to accept.',
    });
    const offline = vi.fn<typeof fetch>(async () => {
      throw new TypeError('Failed to fetch');
    });
    await expect(uploadReferenceLayer(TEAM, fields, file, offline)).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });
});
