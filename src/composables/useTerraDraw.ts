import { onBeforeUnmount, ref, shallowRef, type ShallowRef } from 'vue';
import type { Map as MapLibreMap } from 'maplibre-gl';
import { TerraDraw, TerraDrawPolygonMode, TerraDrawSelectMode, ValidateNotSelfIntersecting, type GeoJSONStoreFeatures } from 'terra-draw';
import { TerraDrawMapLibreGLAdapter } from 'terra-draw-maplibre-gl-adapter';
import type { PolygonGeometry } from '@shared/schemas/planning';
import { DRAW_PREFIX } from '@/map/atlasStyle';
import { closedPolygon } from '@/map/prospectOutline';

/** What the drawing tool is doing: nothing, laying down a new outline corner by corner, or moving corners. */
export type DrawPhase = 'off' | 'drawing' | 'editing';

// Porelith's amber for what is being drawn, so it stands apart from the saved (teal) prospects.
const INK = '#D98E04';
const HALO = '#FFFFFF';

/**
 * Polygon drawing and vertex editing on the map with terra-draw, for prospect outlines. `outline` follows
 * every change, so the form can show the area as it is drawn.
 * @example
 * const draw = useTerraDraw(map);
 * draw.startDrawing(); // click corners, click the first corner (or press Enter) to finish
 * draw.outline.value // the polygon so far
 */
export function useTerraDraw(map: ShallowRef<MapLibreMap | null>) {
  const phase = ref<DrawPhase>('off');
  const outline = shallowRef<PolygonGeometry | null>(null);
  let draw: TerraDraw | null = null;
  let currentId: string | number | null = null;

  function readOutline(): void {
    if (!draw || currentId === null) return;
    const feature = draw.getSnapshotFeature(currentId);
    if (feature?.geometry.type === 'Polygon') outline.value = closedPolygon(feature.geometry.coordinates[0]);
  }

  function ensure(m: MapLibreMap): TerraDraw {
    if (draw) return draw;
    const created = new TerraDraw({
      adapter: new TerraDrawMapLibreGLAdapter({ map: m, prefixId: DRAW_PREFIX }),
      modes: [
        new TerraDrawPolygonMode({
          // Checked when a corner is placed or the outline closed, not on every pointer move.
          validation: (feature, { updateType }) =>
            String(updateType) === 'provisional' ? { valid: true } : ValidateNotSelfIntersecting(feature),
          styles: {
            fillColor: INK,
            fillOpacity: 0.15,
            outlineColor: INK,
            outlineWidth: 2,
            closingPointColor: HALO,
            closingPointOutlineColor: INK,
            closingPointWidth: 5,
            closingPointOutlineWidth: 2,
          },
        }),
        new TerraDrawSelectMode({
          flags: {
            polygon: {
              feature: {
                draggable: false,
                selfIntersectable: false,
                coordinates: { draggable: true, midpoints: true, deletable: true },
              },
            },
          },
          allowManualDeselection: false,
          styles: {
            selectedPolygonColor: INK,
            selectedPolygonFillOpacity: 0.15,
            selectedPolygonOutlineColor: INK,
            selectedPolygonOutlineWidth: 2,
            selectionPointColor: HALO,
            selectionPointOutlineColor: INK,
            selectionPointWidth: 5,
            selectionPointOutlineWidth: 2,
            midPointColor: INK,
            midPointOutlineColor: HALO,
            midPointWidth: 3,
          },
        }),
      ],
    });
    created.start();
    created.on('change', (ids) => {
      if (currentId === null) {
        // While drawing, the new polygon's id is the one terra-draw keeps changing.
        const polygon = ids
          .map((id) => created.getSnapshotFeature(id))
          .find((f) => f?.geometry.type === 'Polygon' && f.properties.mode === 'polygon');
        if (polygon?.id !== undefined && polygon.geometry.type === 'Polygon') {
          outline.value = closedPolygon(polygon.geometry.coordinates[0]);
        }
        return;
      }
      if (ids.includes(currentId)) readOutline();
    });
    created.on('finish', (id, context) => {
      if (context.mode !== 'polygon' || phase.value !== 'drawing') return;
      currentId = id;
      readOutline();
      // Straight into corner editing, so a slip can be fixed before saving.
      created.setMode('select');
      created.selectFeature(id);
      phase.value = 'editing';
    });
    draw = created;
    return created;
  }

  /** Starts a new outline; returns false when the map is not there yet. */
  function startDrawing(): boolean {
    const m = map.value;
    if (!m) return false;
    const d = ensure(m);
    d.clear();
    currentId = null;
    outline.value = null;
    d.setMode('polygon');
    phase.value = 'drawing';
    return true;
  }

  /** Puts an existing outline into the tool with its corners draggable. */
  function startEditing(geometry: PolygonGeometry): boolean {
    const m = map.value;
    if (!m) return false;
    const d = ensure(m);
    d.clear();
    d.setMode('select');
    const id = d.getFeatureId();
    const feature = { id, type: 'Feature', geometry, properties: { mode: 'polygon' } } as GeoJSONStoreFeatures;
    const [result] = d.addFeatures([feature]);
    if (!result?.valid) {
      phase.value = 'off';
      return false;
    }
    currentId = id;
    outline.value = closedPolygon(geometry.coordinates[0]);
    d.selectFeature(id);
    phase.value = 'editing';
    return true;
  }

  /** Leaves the tool empty and inert. */
  function stop(): void {
    if (draw) {
      draw.clear();
      draw.setMode('static');
    }
    currentId = null;
    outline.value = null;
    phase.value = 'off';
  }

  onBeforeUnmount(() => {
    // The map is removed right after; stopping first lets terra-draw remove its own layers cleanly.
    try {
      draw?.stop();
    } catch {
      // Already gone with the map.
    }
    draw = null;
  });

  return { phase, outline, startDrawing, startEditing, stop };
}
