import { describe, expect, it } from 'vitest';
import { grid } from '@shared/interpolation/index';

describe('grid', () => {
  it('lays out cell centres row by row', () => {
    const g = grid([1000, 2000, 2000, 2500], 100);
    expect(g).toMatchObject({ nx: 10, ny: 5, x0: 1050, y0: 2050, cellSize: 100 });
    expect(Array.from(g.xs)).toEqual(Array.from({ length: 10 }, (_, i) => 1050 + 100 * i));
    expect(g.targets).toHaveLength(50);
    expect(g.targets[0]).toEqual({ x: 1050, y: 2050 });
    expect(g.targets[13]).toEqual({ x: 1350, y: 2150 }); // row 1, column 3
  });

  it('covers a partial last cell and does not round 0.7/0.1 up to 8 cells', () => {
    expect(grid([0, 0, 250, 100], 100)).toMatchObject({ nx: 3, ny: 1 });
    expect(grid([0, 0, 0.7, 0.3], 0.1)).toMatchObject({ nx: 7, ny: 3 });
  });

  it('rejects bad boxes, cell sizes and oversize grids with the count', () => {
    expect(() => grid([0, 0, 10, 10], 0)).toThrow('cellSize must be a finite number > 0, got 0');
    expect(() => grid([0, 0, 10, 10], -5)).toThrow('cellSize must be a finite number > 0, got -5');
    expect(() => grid([10, 0, 0, 10], 1)).toThrow('bbox must have minX < maxX and minY < maxY, got [10, 0, 0, 10]');
    expect(() => grid([0, 0, Number.NaN, 10] as never, 1)).toThrow('bbox must be [minX, minY, maxX, maxY] of finite numbers');
    expect(() => grid([0, 0, 100_000, 100_000], 50)).toThrow('Grid of 2000 × 2000 = 4000000 cells exceeds the limit of 1000000');
    expect(() => grid([0, 0, 100, 100], 1, { maxCells: 5000 })).toThrow('Grid of 100 × 100 = 10000 cells exceeds the limit of 5000');
    expect(grid([0, 0, 100, 100], 1, { maxCells: 10_000 }).targets).toHaveLength(10_000);
  });
});
