import { describe, expect, it } from 'vitest';
import { depthAxisLabel, depthOfTvd, depthText, displayDepth, tvdFromDisplay } from './depthFrame';

// Offshore: rotary table 25 m above the sea, 100 m of water.
const datums = { seaLevelTvdM: 25, mudlineTvdM: 125 };

describe('depth datum and unit', () => {
  it('TVDSS = TVD − RT elevation; below mudline = TVDSS − water depth', () => {
    expect(displayDepth(1000, 1010, { mode: 'tvd', datum: 'rt', unit: 'm' }, datums)).toBe(1000);
    expect(displayDepth(1000, 1010, { mode: 'tvd', datum: 'sl', unit: 'm' }, datums)).toBe(975);
    expect(displayDepth(1000, 1010, { mode: 'tvd', datum: 'ml', unit: 'm' }, datums)).toBe(875);
  });

  it('MD is from the rotary table whatever the datum', () => {
    expect(displayDepth(1000, 1010, { mode: 'md', datum: 'ml', unit: 'm' }, datums)).toBe(1010);
  });

  it('feet: 1 ft = 0.3048 m exactly (1959 international foot)', () => {
    // 3048 m TVD below sea level + 25 m: 10,000 ft TVDSS
    expect(displayDepth(3073, 0, { mode: 'tvd', datum: 'sl', unit: 'ft' }, datums)).toBeCloseTo(10_000, 9);
    expect(tvdFromDisplay(10_000, { mode: 'tvd', datum: 'sl', unit: 'ft' }, datums)).toBeCloseTo(3073, 9);
  });

  it('labels the axis with the reference and unit', () => {
    expect(depthAxisLabel({ mode: 'tvd', datum: 'ml', unit: 'ft' })).toBe('TVD below mudline (ft)');
    expect(depthAxisLabel({ mode: 'md', datum: 'sl', unit: 'm' })).toBe('MD from rotary table (m)');
  });

  it('places a TVD in an MD frame through the well’s own MD–TVD pairs (the survey)', () => {
    // A deviated well: 2000 m TVD is 2400 m along the hole; halfway between stations, halfway in MD.
    const grid = { tvdM: Float64Array.of(0, 1000, 2000), mdM: Float64Array.of(0, 1100, 2400) };
    expect(depthOfTvd(1500, grid, { mode: 'md', datum: 'sl', unit: 'm' }, datums)).toBeCloseTo(1750, 9);
    expect(depthOfTvd(1500, grid, { mode: 'tvd', datum: 'sl', unit: 'm' }, datums)).toBe(1475);
    // 2400 m = 7874.0 ft (1 ft = 0.3048 m)
    expect(depthOfTvd(2000, grid, { mode: 'md', datum: 'rt', unit: 'ft' }, datums)).toBeCloseTo(7874.0157, 3);
  });

  it('marks MD depths as MD in text', () => {
    expect(depthText(2046.4, { mode: 'md', datum: 'rt', unit: 'm' })).toBe('2,046 m MD');
    expect(depthText(2046.4, { mode: 'tvd', datum: 'sl', unit: 'ft' })).toBe('2,046 ft');
  });
});
