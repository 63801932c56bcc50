import { describe, expect, it } from 'vitest';
import { DEFAULT_TOGGLES, readToggles } from './layerToggles';

describe('readToggles', () => {
  it('reads stored switches one by one, defaulting garbled values', () => {
    expect(readToggles('{"wellNames":false,"wells":"yes"}')).toEqual({ ...DEFAULT_TOGGLES, wellNames: false });
    expect(readToggles('not json')).toEqual(DEFAULT_TOGGLES);
    expect(readToggles(null)).toEqual(DEFAULT_TOGGLES);
  });
});
