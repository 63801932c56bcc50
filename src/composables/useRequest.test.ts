import { describe, expect, it } from 'vitest';
import { nextTick, ref, watch } from 'vue';
import { ApiClientError } from '@/api/client';
import { useRequest } from './useRequest';

function deferred<T>() {
  let resolve!: (value: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}

describe('useRequest', () => {
  it('goes idle → loading → done and keeps the data', async () => {
    const request = useRequest(async () => [1, 2, 3]);
    expect(request.state.value).toBe('idle');
    const pending = request.run();
    expect(request.state.value).toBe('loading');
    await pending;
    expect(request.state.value).toBe('done');
    expect(request.data.value).toEqual([1, 2, 3]);
  });

  it('keeps the readable message of a failed call', async () => {
    const request = useRequest(async () => {
      throw new ApiClientError(403, 'forbidden', 'Only team admins can do this.');
    });
    await request.run();
    expect(request.state.value).toBe('error');
    expect(request.error.value).toBe('Only team admins can do this.');
  });

  it('lets only the latest call write, even when an older one answers last', async () => {
    const answers = [deferred<string>(), deferred<string>()];
    let call = 0;
    const request = useRequest(() => answers[call++].promise);

    const first = request.run();
    const second = request.run();
    answers[1].resolve('team B');
    await second;
    answers[0].resolve('team A');
    await first;

    expect(request.data.value).toBe('team B');
    expect(request.state.value).toBe('done');
  });

  it('passes its arguments to the task and drops an answer that arrives after reset()', async () => {
    const answer = deferred<string>();
    const asked: string[] = [];
    const request = useRequest((teamId: string) => {
      asked.push(teamId);
      return answer.promise;
    });
    const pending = request.run('team A');
    request.reset();
    answer.resolve('layers of A');
    expect(await pending).toBeNull();
    expect(asked).toEqual(['team A']);
    expect(request.state.value).toBe('idle');
    expect(request.data.value).toBeNull();
  });

  it('applies onDone before a watcher of the state sees done', async () => {
    const shown = ref<string[]>([]);
    const seen: string[][] = [];
    const request = useRequest(async () => ['Blocks'], { onDone: (layers) => (shown.value = layers) });
    watch(request.state, (s) => {
      if (s === 'done') seen.push(shown.value);
    });
    await request.run();
    await nextTick();
    expect(seen).toEqual([['Blocks']]);
  });
});
