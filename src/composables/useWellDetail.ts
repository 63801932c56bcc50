import { computed, ref, watch, type Ref } from 'vue';
import type { LogCurveSummary, PressureObservation, SurveyStation, WellDetail, WellPatchBody } from '@shared/schemas/wells';
import { ApiClientError } from '@/api/client';
import * as wellsApi from '@/api/wells';
import { useRequest } from './useRequest';

/** What saving an edit came to: stored, or refused because someone else saved first. */
export type SaveOutcome = 'saved' | 'stale';

/**
 * One well with its pressures and log curves, reloaded when the team or the well changes; survey stations
 * load only when asked for (a long survey is thousands of rows nobody may open).
 * @example
 * const detail = useWellDetail(toRef(team, 'currentTeamId'), toRef(props, 'wellId'));
 * const outcome = await detail.save({ version: 3, status: 'abandoned' }); // 'saved' | 'stale'
 */
export function useWellDetail(teamId: Ref<string | null>, wellId: Ref<string>) {
  const need =
    <T>(task: (team: string, well: string) => Promise<T>) =>
    () => {
      if (!teamId.value) return Promise.reject(new Error('No team selected'));
      return task(teamId.value, wellId.value);
    };
  const well = useRequest<WellDetail>(need(wellsApi.getWell));
  const pressures = useRequest<PressureObservation[]>(need(wellsApi.listPressures));
  const logs = useRequest<LogCurveSummary[]>(need(wellsApi.listLogCurves));
  const stations = useRequest<SurveyStation[]>(need(wellsApi.listSurveyStations));
  /** Set when a save met a newer version; cleared by reloading. */
  const stale = ref(false);

  async function reload(): Promise<void> {
    stale.value = false;
    const tasks: Promise<unknown>[] = [well.run(), pressures.run(), logs.run()];
    if (stations.state.value !== 'idle') tasks.push(stations.run());
    await Promise.all(tasks);
  }

  function loadStations(): void {
    if (stations.state.value === 'idle' || stations.state.value === 'error') void stations.run();
  }

  /**
   * Sends the edit. A 409 is either a stale version (someone saved in between: 'stale', nothing stored)
   * or a name/UWI clash with another well (rethrown with the server's message); reading the current version
   * tells them apart.
   */
  async function save(body: WellPatchBody): Promise<SaveOutcome> {
    if (!teamId.value) throw new Error('No team selected');
    try {
      well.data.value = await wellsApi.patchWell(teamId.value, wellId.value, body);
      return 'saved';
    } catch (e) {
      if (e instanceof ApiClientError && e.status === 409) {
        const current = await wellsApi.getWell(teamId.value, wellId.value);
        if (current.version !== body.version) {
          stale.value = true;
          return 'stale';
        }
      }
      throw e;
    }
  }

  watch([teamId, wellId], () => {
    stations.data.value = null;
    stations.state.value = 'idle';
    void reload();
  });
  void reload();

  return {
    well: computed(() => well.data.value),
    wellState: well.state,
    wellError: well.error,
    pressures: computed(() => pressures.data.value ?? []),
    pressuresState: pressures.state,
    pressuresError: pressures.error,
    logs: computed(() => logs.data.value ?? []),
    logsState: logs.state,
    logsError: logs.error,
    stations: computed(() => stations.data.value ?? []),
    stationsState: stations.state,
    stationsError: stations.error,
    stale,
    reload,
    loadStations,
    save,
  };
}
