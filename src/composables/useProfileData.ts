import { computed, watch, type Ref } from 'vue';
import type { LogCurveData, LogCurveSummary, PressureObservation, SurveyStation, WellDetail } from '@shared/schemas/wells';
import type { Interpretation } from '@shared/schemas/interpretations';
import {
  alignLogs,
  profileWellFromHeader,
  type AlignedLogs,
  type LogCurveInput,
  type ProfileLogRole,
  type ProfileWell,
} from '@shared/profile';
import * as wellsApi from '@/api/wells';
import * as profileApi from '@/api/profile';
import { useRequest } from './useRequest';

export const PROFILE_ROLES: readonly ProfileLogRole[] = ['sonic', 'resistivity', 'density', 'gamma'];

/**
 * The curve to use for each role: the one with most samples (a well may hold a re-logged or edited copy).
 * @example pickCurves(curves).sonic?.mnemonic; // 'DT'
 */
export function pickCurves(curves: readonly LogCurveSummary[]): Partial<Record<ProfileLogRole, LogCurveSummary>> {
  const out: Partial<Record<ProfileLogRole, LogCurveSummary>> = {};
  for (const c of curves) {
    if (!(PROFILE_ROLES as readonly string[]).includes(c.role)) continue;
    const role = c.role as ProfileLogRole;
    if (!out[role] || c.samples > out[role]!.samples) out[role] = c;
  }
  return out;
}

/**
 * A well's datums as the profile builder wants them, by the rule the server's surfaces share (`profileWellFromHeader`).
 * @example profileWell({ datumElevationM: 25, waterDepthM: 100, airGapM: null, groundElevationM: null, offshore: true }); // airGapM 25
 */
export function profileWell(
  w: Pick<WellDetail, 'datumElevationM' | 'waterDepthM' | 'airGapM' | 'groundElevationM' | 'offshore'>,
): ProfileWell {
  return profileWellFromHeader(w);
}

export interface ProfileData {
  well: WellDetail;
  pressures: PressureObservation[];
  stations: SurveyStation[];
  curves: Partial<Record<ProfileLogRole, LogCurveSummary>>;
  aligned: AlignedLogs;
  versions: Interpretation[];
}

/**
 * Everything one well's profile needs, loaded together: header, pressures, survey, the full-resolution sonic,
 * resistivity, density and gamma-ray curves (a few thousand samples each, needed for computing, not only for
 * drawing) put on one TVD grid, and the saved interpretation versions.
 * @example const data = useProfileData(teamId, wellId); await data.reload(); data.data.value?.aligned.tvdM
 */
export function useProfileData(teamId: Ref<string | null>, wellId: Ref<string>) {
  const request = useRequest(async (team: string | null, id: string) => {
    if (!team) throw new Error('No team selected');
    return load(team, id);
  });
  const data = request.data;

  async function load(team: string, id: string): Promise<ProfileData> {
    const [well, pressures, stations, curveList, versions] = await Promise.all([
      wellsApi.getWell(team, id),
      wellsApi.listPressures(team, id),
      wellsApi.listSurveyStations(team, id),
      wellsApi.listLogCurves(team, id),
      profileApi.listInterpretations(team, id),
    ]);
    const curves = pickCurves(curveList);
    const full: [ProfileLogRole, LogCurveData][] = await Promise.all(
      (Object.entries(curves) as [ProfileLogRole, LogCurveSummary][]).map(
        async ([role, c]) => [role, await wellsApi.getLogCurve(team, id, c.id)] as [ProfileLogRole, LogCurveData],
      ),
    );
    const inputs: LogCurveInput[] = full.map(([role, c]) => ({ role, unit: c.unit, mdM: c.mdM, values: c.values }));
    const aligned = alignLogs(inputs, stations);
    return { well, pressures, stations, curves, aligned, versions };
  }

  async function reload(): Promise<void> {
    await request.run(teamId.value, wellId.value);
  }

  /** Only the versions list, after a save or restore. */
  async function reloadVersions(): Promise<Interpretation[]> {
    if (!teamId.value || !data.value) return [];
    const versions = await profileApi.listInterpretations(teamId.value, wellId.value);
    data.value = { ...data.value, versions };
    return versions;
  }

  watch([teamId, wellId], () => void reload());

  return { state: request.state, error: request.error, data, reload, reloadVersions, well: computed(() => data.value?.well ?? null) };
}
