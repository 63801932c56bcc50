import { computed, onScopeDispose, ref, shallowRef, type Ref } from 'vue';
import { ApiClientError } from '@/api/client';
import type { ImportCommit, ImportKind, ImportPreview } from '@shared/schemas/imports';
import type { JobPhase } from '@shared/schemas/jobs';
import { importError, previewImport, startImportJob } from '@/api/imports';
import { getJob } from '@/api/jobs';
import {
  assignField,
  commitBlocker,
  importRequest,
  isCsvKind,
  mappingFromCsv,
  type ColumnMapping,
  type ImportChoices,
} from '@/components/import/importModel';
import type { LoadState } from '@/stores/session';
import { useRequest } from './useRequest';

/** Pause after a mapping or unit change before the preview is asked again (a few quick clicks, one request). */
export const PREVIEW_DELAY_MS = 250;
/** How often a running commit job is asked for its progress. */
export const POLL_INTERVAL_MS = 400;

export interface CommitProgress {
  state: LoadState;
  /** The server job's phase; null while the file is still being sent. */
  phase: JobPhase | null;
  done: number;
  total: number;
  result: ImportCommit | null;
  error: ApiClientError | null;
}

const idleCommit = (): CommitProgress => ({ state: 'idle', phase: null, done: 0, total: 0, result: null, error: null });

const freshChoices = (kind: ImportKind): ImportChoices => ({ kind, mapping: null, units: {}, epsg: 4326, wellId: null, curveRoles: {} });

/**
 * The whole Import page as state: the file kept in memory, the choices made about it, the preview the
 * server made from them (asked again after each change), and the commit run as a polled job.
 * @example
 * const session = useImportSession(toRef(team, 'currentTeamId'));
 * session.chooseFile(file);            // preview runs
 * session.setColumnField('TD', 'tdMd'); // preview runs again
 * await session.commit();              // session.progress.value.state → 'done'
 */
export function useImportSession(teamId: Ref<string | null>, options: { onCommitted?: () => void } = {}) {
  const file = shallowRef<File | null>(null);
  const choices = ref<ImportChoices>(freshChoices('wells'));
  const skipInvalid = ref(false);
  const onDuplicate = ref<'update' | 'skip' | null>(null);
  const progress = ref<CommitProgress>(idleCommit());
  let disposed = false;

  let previewCall = 0;
  const preview = useRequest<ImportPreview>(async () => {
    if (!teamId.value || !file.value) throw new Error('Choose a file first.');
    const call = ++previewCall;
    const result = await previewImport(teamId.value, importRequest(choices.value), file.value);
    // An older reply (another file or kind, still in flight) must not set the suggestions for this one.
    if (call === previewCall) adoptSuggestions(result);
    return result;
  });

  /** The first preview of a file carries the server's suggestions; from then on the page's choices lead. */
  function adoptSuggestions(result: ImportPreview): void {
    const c = choices.value;
    if (result.csv && c.mapping === null) {
      choices.value = { ...c, mapping: mappingFromCsv(result.csv), units: { ...result.csv.units } };
    }
    if (result.las && Object.keys(c.curveRoles).length === 0) {
      choices.value = { ...choices.value, curveRoles: Object.fromEntries(result.las.plan.curves.map((cv) => [cv.mnemonic, cv.role])) };
    }
  }

  let timer: ReturnType<typeof setTimeout> | undefined;
  function previewSoon(): void {
    clearTimeout(timer);
    timer = setTimeout(() => void preview.run(), PREVIEW_DELAY_MS);
  }
  function previewNow(): Promise<unknown> {
    clearTimeout(timer);
    return preview.run();
  }

  function restart(kind: ImportKind): void {
    choices.value = freshChoices(kind);
    skipInvalid.value = false;
    onDuplicate.value = null;
    progress.value = idleCommit();
  }

  function chooseFile(next: File): Promise<unknown> {
    file.value = next;
    restart(choices.value.kind);
    return previewNow();
  }

  function chooseKind(kind: ImportKind): void {
    if (kind === choices.value.kind) return;
    restart(kind);
    preview.data.value = null;
    preview.state.value = 'idle';
    if (file.value) void previewNow();
  }

  function update(patch: Partial<ImportChoices>): void {
    choices.value = { ...choices.value, ...patch };
    previewSoon();
  }

  const setColumnField = (column: string, field: string | null) =>
    update({ mapping: assignField(choices.value.mapping ?? {}, column, field) });
  const setUnit = (field: string, unit: string) => update({ units: { ...choices.value.units, [field]: unit } });
  const setEpsg = (epsg: number) => update({ epsg });
  const setWell = (wellId: string | null) => update({ wellId });
  const setCurveRole = (mnemonic: string, role: string) => update({ curveRoles: { ...choices.value.curveRoles, [mnemonic]: role } });

  /** Forgets the file and every choice (after an import, to start the next one). */
  function clear(): void {
    clearTimeout(timer);
    file.value = null;
    restart(choices.value.kind);
    preview.data.value = null;
    preview.state.value = 'idle';
  }

  const blocker = computed(() => {
    if (!file.value) return 'Choose a file first.';
    if (preview.state.value === 'loading') return 'Checking the file…';
    if (!preview.data.value) return preview.state.value === 'error' ? 'The file could not be checked.' : 'Checking the file…';
    return commitBlocker(preview.data.value, { skipInvalid: skipInvalid.value, onDuplicate: onDuplicate.value });
  });

  const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

  /** Commits as a server job and follows it to the end; the outcome or the refusal lands in `progress`. */
  async function commit(): Promise<void> {
    if (!teamId.value || !file.value || blocker.value) return;
    const team = teamId.value;
    progress.value = { ...idleCommit(), state: 'loading' };
    try {
      const request = {
        ...importRequest(choices.value),
        skipInvalid: isCsvKind(choices.value.kind) && skipInvalid.value,
        ...(onDuplicate.value && preview.data.value?.duplicateOf ? { onDuplicate: onDuplicate.value } : {}),
      };
      const { jobId } = await startImportJob(team, request, file.value);
      for (;;) {
        if (disposed) return;
        const job = await getJob(team, jobId, 'import');
        progress.value = { ...progress.value, phase: job.phase, done: job.done, total: job.total };
        if (job.state === 'error' && job.error) {
          throw importError(job.error.status, job.error.code, job.error.message, job.error.details);
        }
        if (job.state === 'done') {
          if (!job.result || job.result.dryRun)
            throw new ApiClientError(200, 'unexpected_reply', 'The import finished, but its outcome could not be read.');
          progress.value = { ...progress.value, state: 'done', result: job.result };
          break;
        }
        await sleep(POLL_INTERVAL_MS);
      }
    } catch (e) {
      const error = e instanceof ApiClientError ? e : new ApiClientError(0, 'client_error', (e as Error).message);
      progress.value = { ...progress.value, state: 'error', error };
    }
    options.onCommitted?.();
  }

  onScopeDispose(() => {
    disposed = true;
    clearTimeout(timer);
  });

  return {
    file,
    choices,
    kind: computed(() => choices.value.kind),
    mapping: computed<ColumnMapping>(() => choices.value.mapping ?? {}),
    skipInvalid,
    onDuplicate,
    preview: preview.data,
    previewState: preview.state,
    previewError: preview.error,
    progress,
    blocker,
    chooseFile,
    chooseKind,
    setColumnField,
    setUnit,
    setEpsg,
    setWell,
    setCurveRole,
    clear,
    commit,
    refreshPreview: previewNow,
  };
}
