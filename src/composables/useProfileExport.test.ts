// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { PROFILE_CAUTION } from '@shared/profile';
import { fileStem, svgText } from './useProfileExport';

function svgWith(text: string): SVGSVGElement {
  const svg = document.createElementNS('http://www.w3.org/2000/svg', 'svg');
  const t = document.createElementNS('http://www.w3.org/2000/svg', 'text');
  t.textContent = text;
  svg.appendChild(t);
  return svg;
}

describe('figure export', () => {
  it('carries the caution line into the SVG text', () => {
    const text = svgText(svgWith(PROFILE_CAUTION));
    expect(text.startsWith('<?xml')).toBe(true);
    expect(text).toContain('verify with the responsible licensed engineer and local regulations');
  });
  it('drops the scoped-style markers of the page', () => {
    const svg = svgWith(PROFILE_CAUTION);
    svg.setAttribute('data-v-1a2b3c4d', '');
    svg.firstElementChild!.setAttribute('data-v-1a2b3c4d', '');
    const text = svgText(svg);
    expect(text).not.toContain('data-v-');
    expect(text).toContain(PROFILE_CAUTION);
  });

  it('refuses a figure without the caution', () => {
    expect(() => svgText(svgWith('just a plot'))).toThrow('The figure lost its caution line; not exported.');
  });
  it('refuses a demo-data figure that does not say it is synthetic', () => {
    expect(() => svgText(svgWith(PROFILE_CAUTION), { synthetic: true })).toThrow(
      'The figure of demo data does not say it is synthetic; not exported.',
    );
    expect(svgText(svgWith(`${PROFILE_CAUTION} Synthetic demo data`), { synthetic: true })).toContain('Synthetic demo data');
  });
  it('makes file-safe names', () => {
    expect(fileStem('AVX-08 / side track')).toBe('AVX-08_side_track');
  });
});
