import { describe, expect, it } from 'vitest';
import { invalidGeometryMessage, jsonErrorAt } from '../../../server/features/layers/layerMessages';

describe('reference-layer messages', () => {
  it('turns a JSON.parse offset into the line and column an editor shows', () => {
    const text = '{\n  "type": "FeatureCollection",\n  "features": [1 2]\n}';
    let err: Error | null = null;
    try {
      JSON.parse(text);
    } catch (e) {
      err = e as Error;
    }
    // The reference is Node's own parser: whatever offset it reports lands on the "2" of line 3.
    const msg = jsonErrorAt(text, err!);
    expect(msg).toMatch(/^line 3, column 18: /); // the "2" after "[1 "
    expect(msg).not.toMatch(/position/);
  });

  it('names the feature and says in words where its outline crosses itself', () => {
    expect(invalidGeometryMessage(1, { name: 'Bowtie' }, 'Self-intersection[-101.225 -32.625]')).toBe(
      'Feature 1 ("Bowtie") is not a valid geometry: its outline crosses itself near lon -101.225, lat -32.625.',
    );
    expect(invalidGeometryMessage(3, {}, 'Too few points[1 2]')).toBe(
      'Feature 3 is not a valid geometry: it has too few points near lon 1, lat 2.',
    );
    expect(invalidGeometryMessage(2, null, 'Something new')).toBe('Feature 2 is not a valid geometry: something new.');
  });
});
