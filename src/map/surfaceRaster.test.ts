import { describe, expect, it } from 'vitest';
import { DEPTH_RAMP, rampColour } from '@/plots/surfaceRamp';
import { gridRange, gridToRgba } from './surfaceRaster';

const colour = rampColour(DEPTH_RAMP);
const pixel = (px: Uint8ClampedArray, nx: number, col: number, row: number) =>
  Array.from(px.slice((row * nx + col) * 4, (row * nx + col) * 4 + 4));

describe('gridToRgba', () => {
  // Grid rows go south → north; image rows go north → south (canvas ImageData, HTML spec).
  const values = [1, 2, null, 4]; // south row: 1, 2; north row: null, 4
  const px = gridToRgba(values, 2, 2, [1, 4], DEPTH_RAMP);

  it('puts the north grid row on the first image row', () => {
    expect(pixel(px, 2, 1, 0)).toEqual([...colour(1), 255]); // value 4 = top of the domain
    expect(pixel(px, 2, 0, 1)).toEqual([...colour(0), 255]); // value 1 = bottom of the domain
    // (2 − 1) / (4 − 1) = 1/3 of the way along the ramp, worked by hand in surfaceRamp.test.ts.
    expect(pixel(px, 2, 1, 1)).toEqual([181, 165, 100, 255]);
  });

  it('leaves cells without a value transparent', () => {
    expect(pixel(px, 2, 0, 0)).toEqual([0, 0, 0, 0]);
  });

  it('keeps the column order of a wider grid', () => {
    const wide = gridToRgba([1, 2, 3, 4, 5, 6], 3, 2, [1, 6], DEPTH_RAMP);
    expect(pixel(wide, 3, 0, 0)).toEqual([...colour(3 / 5), 255]); // value 4: north row, west cell
    expect(pixel(wide, 3, 2, 1)).toEqual([...colour(2 / 5), 255]); // value 3: south row, east cell
  });

  it('paints a flat surface with the middle of the ramp', () => {
    expect(pixel(gridToRgba([5], 1, 1, [5, 5], DEPTH_RAMP), 1, 0, 0)).toEqual([...colour(0.5), 255]);
  });

  it('refuses a value count that does not match the grid', () => {
    expect(() => gridToRgba([1, 2, 3], 2, 2, [0, 1], DEPTH_RAMP)).toThrow('Grid has 3 values, expected nx × ny = 4');
  });
});

describe('gridRange', () => {
  it('ignores nulls', () => {
    expect(gridRange([3, null, 1, 7])).toEqual([1, 7]);
    expect(gridRange([null, null])).toBeNull();
  });
});
