import { describe, expect, it } from 'vitest';
import { DEPTH_RAMP, RESIDUAL_RAMP, rampColour, rampGradientCss } from './surfaceRamp';

// Expected colours are worked by hand from the hex stops: linear RGB blending, rounded to integers.
describe('rampColour', () => {
  const depth = rampColour(DEPTH_RAMP);

  it('returns the stop colours at the stops', () => {
    expect(depth(0)).toEqual([0xfc, 0xeb, 0xb0]);
    expect(depth(0.5)).toEqual([0x3e, 0x9e, 0x96]);
    expect(depth(1)).toEqual([0x25, 0x2a, 0x66]);
  });

  it('blends linearly between stops', () => {
    // One third of the way from #F0A94B (0.25) to #3E9E96 (0.5): 240−178/3, 169−11/3, 75+75/3.
    expect(depth(1 / 3)).toEqual([181, 165, 100]);
    // Halfway from #2F6DB5 (0) to #F7F7F5 (0.5) of the residual ramp: the mean of each channel.
    expect(rampColour(RESIDUAL_RAMP)(0.25)).toEqual([Math.round((47 + 247) / 2), Math.round((109 + 247) / 2), Math.round((181 + 245) / 2)]);
  });

  it('clamps outside 0…1', () => {
    expect(depth(-2)).toEqual(depth(0));
    expect(depth(7)).toEqual(depth(1));
  });

  it('refuses a ramp whose stops are out of order', () => {
    expect(() =>
      rampColour([
        [0.5, '#000'],
        [0.2, '#fff'],
      ]),
    ).toThrow('Colour ramp stops must be in increasing order');
  });
});

describe('rampGradientCss', () => {
  it('lists the stops as percentages', () => {
    expect(rampGradientCss(RESIDUAL_RAMP)).toBe('linear-gradient(to right, #2F6DB5 0%, #F7F7F5 50%, #C23B22 100%)');
  });
});
