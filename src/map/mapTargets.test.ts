import { describe, expect, it } from 'vitest';
import { ATLAS_LAYERS } from './atlasLayers';
import { countRenderedWells, mapTargetOf, type RenderedFeatureLike } from './mapTargets';

const f = (layer: string, properties: Record<string, unknown>, coordinates: number[] = [-101, -32.5]): RenderedFeatureLike => ({
  layer: { id: layer },
  properties,
  geometry: { type: 'Point', coordinates },
});

describe('mapTargetOf', () => {
  it('prefers a planned well over the well and the prospect under it', () => {
    const hits = [
      f(ATLAS_LAYERS.prospectFill, { id: 'p1' }),
      f(ATLAS_LAYERS.wells, { id: 'w1' }),
      f(ATLAS_LAYERS.plannedWells, { id: 'pw1' }),
    ];
    expect(mapTargetOf(hits)).toEqual({ kind: 'plannedWell', id: 'pw1' });
    expect(mapTargetOf(hits.slice(0, 2))).toEqual({ kind: 'well', id: 'w1' });
    expect(mapTargetOf(hits.slice(0, 1))).toEqual({ kind: 'prospect', id: 'p1' });
  });

  it('turns a cluster into a place to zoom to, and an offset ring into its well', () => {
    expect(mapTargetOf([f(ATLAS_LAYERS.clusters, { cluster: true, count: 9 }, [-100.5, -32.1])])).toEqual({
      kind: 'cluster',
      lon: -100.5,
      lat: -32.1,
      count: 9,
    });
    expect(mapTargetOf([f(ATLAS_LAYERS.offsetCandidates, { wellId: 'w7', kind: 'candidate' })])).toEqual({ kind: 'well', id: 'w7' });
  });

  it('ignores labels, basemap layers and features without an id', () => {
    expect(mapTargetOf([f(ATLAS_LAYERS.wellLabels, { id: 'w1' }), f('basemap-land', {}), f(ATLAS_LAYERS.wells, { id: '' })])).toBeNull();
  });
});

describe('countRenderedWells', () => {
  it('counts each well once even when two tiles draw it, and adds cluster counts', () => {
    const features = [
      f(ATLAS_LAYERS.wells, { id: 'w1' }),
      f(ATLAS_LAYERS.wells, { id: 'w1' }),
      f(ATLAS_LAYERS.wells, { id: 'w2' }),
      f(ATLAS_LAYERS.clusters, { cluster: true, count: 12 }, [1, 2]),
      f(ATLAS_LAYERS.clusters, { cluster: true, count: 12 }, [1, 2]),
      f(ATLAS_LAYERS.clusters, { cluster: true, count: 5 }, [3, 4]),
      f(ATLAS_LAYERS.pressureRing, { id: 'w3' }),
    ];
    expect(countRenderedWells(features)).toBe(2 + 12 + 5);
    expect(countRenderedWells([])).toBe(0);
  });
});
