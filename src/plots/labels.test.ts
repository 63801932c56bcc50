import { describe, expect, it } from 'vitest';
import { clearSpot, readoutLeft, staggerLabels } from './labels';

describe('hover read-out placement', () => {
  it('sits right of the pointer while that clears the legend, else flips left', () => {
    expect(readoutLeft(500, 250, 900)).toBe(516);
    // 700 + 16 + 250 = 966 would run into a legend starting at 900
    expect(readoutLeft(700, 250, 900)).toBe(434);
    expect(readoutLeft(100, 250, 200)).toBe(0);
  });
});

describe('staggered labels', () => {
  it('keeps labels at least one height apart, in their input order', () => {
    expect(staggerLabels([104, 100, 300], 13)).toEqual([113, 100, 300]);
    expect(staggerLabels([200, 201, 202], 13)).toEqual([200, 213, 226]);
  });
  it('pushes back up from the bottom limit', () => {
    expect(staggerLabels([95, 98], 13, 0, 100)).toEqual([87, 100]);
  });
  it('leaves labels that are far apart alone', () => {
    expect(staggerLabels([10, 50], 13)).toEqual([10, 50]);
  });
});

describe('label spot on a line', () => {
  it('takes the right end when no curve crosses it', () => {
    expect(clearSpot([400, 500], 300, 900, 80)).toEqual({ x: 894, anchor: 'end' });
  });
  it('moves to the left end when a curve crosses the right end', () => {
    expect(clearSpot([860], 300, 900, 80)).toEqual({ x: 306, anchor: 'start' });
  });
  it('uses the widest gap when both ends are taken', () => {
    expect(clearSpot([320, 500, 880], 300, 900, 80)).toEqual({ x: 690, anchor: 'middle' });
  });
});
