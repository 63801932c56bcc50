import { computed, watch, type Ref } from 'vue';
import type { UploadRecord } from '@shared/schemas/imports';
import { listUploads } from '@/api/imports';
import { useRequest } from './useRequest';

/**
 * The team's uploads, newest first, reloaded when the team changes and after each import.
 * @example const { uploads, reload } = useUploadHistory(toRef(team, 'currentTeamId'));
 */
export function useUploadHistory(teamId: Ref<string | null>) {
  const request = useRequest<UploadRecord[]>(() => (teamId.value ? listUploads(teamId.value) : Promise.resolve([])));
  watch(teamId, () => void request.run(), { immediate: true });
  return { uploads: computed(() => request.data.value ?? []), state: request.state, error: request.error, reload: request.run };
}
