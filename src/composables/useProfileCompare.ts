import { ref, shallowRef, watch, type Ref } from 'vue';
import type { Interpretation } from '@shared/schemas/interpretations';
import type { PressureObservation, WellDetail } from '@shared/schemas/wells';
import { G } from '@shared/units';
import {
  alignLogs,
  buildProfile,
  curveWindow,
  isGoodPoreMeasurement,
  measuredWindow,
  type DrillingWindow,
  type LogCurveInput,
  type Profile,
  type ProfileLogRole,
  type WellDatums,
} from '@shared/profile';
import * as wellsApi from '@/api/wells';
import * as profileApi from '@/api/profile';
import { useRequest } from './useRequest';
import { DATUM_LABELS, displayDepth, type DepthFrame } from '@/plots/depthFrame';
import { pickCurves, profileWell } from './useProfileData';

/** One well of the comparison with what the table and the plot need. */
export interface CompareWell {
  well: WellDetail;
  pressures: PressureObservation[];
  interpretation: Interpretation | null;
  profile: Profile | null;
  /** Top of overpressure of the accepted interpretation, TVD below the rig datum, m. */
  topTvdM: number | null;
  /** Heaviest pore pressure as EMW, kg/m³, and where it came from. */
  maxEmwKgM3: number;
  maxEmwBasis: 'interpreted' | 'measured' | 'none';
  window: DrillingWindow;
  windowBasis: 'interpreted' | 'LOT and mud weights' | 'none';
  error: string | null;
}

/**
 * Parses `?wells=id1,id2,…`: trimmed, de-duplicated, at most `max` ids (order kept).
 * @example parseWellIds(' a, b,a ,,c'); // ['a', 'b', 'c']
 */
export function parseWellIds(query: unknown, max = 8): string[] {
  const raw = Array.isArray(query) ? query.join(',') : typeof query === 'string' ? query : '';
  return [
    ...new Set(
      raw
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean),
    ),
  ].slice(0, max);
}

/**
 * The numbers the comparison table shows for one well, from its profile (when interpreted) or its measurements.
 * @example summarise(profile, pressures).windowBasis; // 'interpreted'
 */
export function summarise(profile: Profile | null, pressures: readonly PressureObservation[]) {
  const measuredMax = pressures.filter(isGoodPoreMeasurement).reduce((m, o) => Math.max(m, o.valueSi / (G * o.tvdM)), -Infinity);
  const interpretedWindow = profile?.porePa && profile.fracturePa ? profile.window : null;
  const maxEmwKgM3 = interpretedWindow && Number.isFinite(interpretedWindow.maxPoreKgM3) ? interpretedWindow.maxPoreKgM3 : measuredMax;
  const maxEmwBasis: CompareWell['maxEmwBasis'] =
    interpretedWindow && Number.isFinite(interpretedWindow.maxPoreKgM3)
      ? 'interpreted'
      : Number.isFinite(measuredMax)
        ? 'measured'
        : 'none';
  const measured = measuredWindow(pressures);
  const window = interpretedWindow && Number.isFinite(interpretedWindow.widthKgM3) ? interpretedWindow : measured;
  const windowBasis: CompareWell['windowBasis'] =
    window === interpretedWindow ? 'interpreted' : Number.isFinite(measured.widthKgM3) ? 'LOT and mud weights' : 'none';
  return { maxEmwKgM3: Number.isFinite(maxEmwKgM3) ? maxEmwKgM3 : NaN, maxEmwBasis, window, windowBasis };
}

/**
 * What a well's window was read from, with the depth of its narrowest point in the page's unit and datum.
 * @example windowBasisText('interpreted', 3655, { mode: 'tvd', datum: 'sl', unit: 'm' }, { seaLevelTvdM: 25, mudlineTvdM: 546 });
 * // 'fracture − pore at 3,630 m TVD below sea level (interpreted)'
 */
export function windowBasisText(basis: CompareWell['windowBasis'], widthTvdM: number, frame: DepthFrame, datums: WellDatums): string {
  if (basis === 'none') return 'no data';
  const at = Number.isFinite(widthTvdM)
    ? ` at ${displayDepth(widthTvdM, widthTvdM, frame, datums).toLocaleString('en', { maximumFractionDigits: 0 })} ${frame.unit} TVD below ${DATUM_LABELS[frame.datum]}`
    : '';
  return basis === 'interpreted' ? `fracture − pore${at} (interpreted)` : `shoe test${at} − heaviest mud below it`;
}

async function loadOne(teamId: string, wellId: string): Promise<CompareWell> {
  const [well, pressures, interpretation] = await Promise.all([
    wellsApi.getWell(teamId, wellId),
    wellsApi.listPressures(teamId, wellId),
    profileApi.currentInterpretation(teamId, wellId),
  ]);
  let profile: Profile | null = null;
  let error: string | null = null;
  if (interpretation) {
    try {
      const [stations, list] = await Promise.all([wellsApi.listSurveyStations(teamId, wellId), wellsApi.listLogCurves(teamId, wellId)]);
      const curves = pickCurves(list);
      const inputs: LogCurveInput[] = await Promise.all(
        (Object.entries(curves) as [ProfileLogRole, { id: string }][]).map(async ([role, c]) => {
          const data = await wellsApi.getLogCurve(teamId, wellId, c.id);
          return { role, unit: data.unit, mdM: data.mdM, values: data.values };
        }),
      );
      const aligned = alignLogs(inputs, stations);
      profile = buildProfile({
        well: profileWell(well),
        tvdM: aligned.tvdM,
        mdM: aligned.mdM,
        logs: aligned.logs,
        interpretation,
        observations: pressures,
        baseTvdM: well.tdTvdM ?? undefined,
        top: interpretation.top
          ? { marginKgM3: interpretation.top.marginKgM3, minThicknessM: interpretation.top.minThicknessM }
          : undefined,
      });
    } catch (e) {
      error = e instanceof Error ? e.message : String(e);
    }
  }
  return { well, pressures, interpretation, profile, topTvdM: interpretation?.top?.tvdM ?? null, error, ...summarise(profile, pressures) };
}

/** For tests: the window of a profile, or of nothing. */
export const emptyWindow = (): DrillingWindow => curveWindow([], [], []);

/**
 * Loads the wells of a comparison (each with its accepted interpretation rebuilt into a profile), reloading
 * when the list changes. A well that fails is reported in `failed` rather than failing the page.
 * @example const cmp = useProfileCompare(teamId, ids); cmp.wells.value.map((w) => w.topTvdM);
 */
export function useProfileCompare(teamId: Ref<string | null>, ids: Ref<string[]>) {
  const wells = shallowRef<CompareWell[]>([]);
  const failed = ref<{ id: string; message: string }[]>([]);
  const request = useRequest(
    async (team: string | null, list: readonly string[]) => {
      if (!team || list.length === 0) return [];
      return Promise.allSettled(list.map((id) => loadOne(team, id)));
    },
    {
      onDone: (results, _team, list) => {
        wells.value = results.flatMap((r) => (r.status === 'fulfilled' ? [r.value] : []));
        failed.value = results.flatMap((r, i) =>
          r.status === 'rejected' ? [{ id: list[i], message: r.reason instanceof Error ? r.reason.message : String(r.reason) }] : [],
        );
      },
    },
  );

  async function reload(): Promise<void> {
    await request.run(teamId.value, [...ids.value]);
  }

  watch([teamId, ids], () => void reload(), { immediate: true });
  return { state: request.state, wells, failed, reload };
}
