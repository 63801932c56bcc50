import { describe, expect, it } from 'vitest';
import { DEFAULT_TOGGLES, readReferenceToggles, readToggles, referenceShown, withoutReference } from './layerToggles';

describe('readToggles', () => {
  it('reads stored switches one by one, defaulting garbled values', () => {
    expect(readToggles('{"wellNames":false,"wells":"yes"}')).toEqual({ ...DEFAULT_TOGGLES, wellNames: false });
    expect(readToggles('not json')).toEqual(DEFAULT_TOGGLES);
    expect(readToggles(null)).toEqual(DEFAULT_TOGGLES);
  });
});

describe('reference layer switches', () => {
  const A = '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10';
  const B = '7c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f';

  it('keeps only layer ids with true/false, forgetting garbled storage', () => {
    expect(readReferenceToggles(JSON.stringify({ [A]: false, [B]: 'off', wells: true }))).toEqual({ [A]: false });
    expect(readReferenceToggles('[1,2]')).toEqual({});
    expect(readReferenceToggles('{oops')).toEqual({});
    expect(readReferenceToggles(null)).toEqual({});
  });

  it('shows a layer never switched, and forgets a deleted one', () => {
    expect(referenceShown({}, A)).toBe(true);
    expect(referenceShown({ [A]: false }, A)).toBe(false);
    expect(withoutReference({ [A]: false, [B]: true }, A)).toEqual({ [B]: true });
  });
});
