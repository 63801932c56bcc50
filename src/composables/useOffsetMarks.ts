import { computed } from 'vue';
import { candidateMarks, offsetFeatures, type OffsetFeatureCollection, type OffsetMark } from '@/map/offsetFeatures';
import { useOffsetPickingStore } from '@/stores/offsetPicking';
import { usePlanningStore } from '@/stores/planning';

/**
 * What the map draws for offset picking: the ranked candidates, plus picked wells outside the search placed from the
 * team's known wells, each with a line from the selected planned well.
 * @example
 * const { offsetGeoJson } = useOffsetMarks();
 */
export function useOffsetMarks() {
  const plan = usePlanningStore();
  const offsets = useOffsetPickingStore();

  const offsetMarks = computed<OffsetMark[]>(() => {
    const marks = candidateMarks(offsets.candidates, offsets.pickedIds);
    const shown = new Set(marks.map((m) => m.wellId));
    for (const p of offsets.picks) {
      const w = plan.wellsById.get(p.wellId);
      if (!shown.has(p.wellId) && w) marks.push({ wellId: p.wellId, name: p.name, lon: w.lon, lat: w.lat, rank: null, picked: true });
    }
    return marks;
  });

  const offsetGeoJson = computed<OffsetFeatureCollection>(() => {
    const pw = plan.selectedPlannedWell;
    if (!pw) return offsetFeatures(null, []);
    return offsetFeatures(pw.location.coordinates, offsetMarks.value);
  });

  return { offsetMarks, offsetGeoJson };
}
