import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import type { Membership, Session, SignInBody, User } from '@shared/schemas/auth';
import * as authApi from '@/api/auth';
import { ApiClientError } from '@/api/client';

/** Where a request stands; shared by stores and composables. */
export type LoadState = 'idle' | 'loading' | 'done' | 'error';

/**
 * Who is signed in and in which teams. The server's cookie is the truth; this mirrors `/api/auth/me`.
 * @example
 * const session = useSessionStore();
 * await session.signIn({ email, password });
 * session.isSignedIn // true
 */
export const useSessionStore = defineStore('session', () => {
  const user = ref<User | null>(null);
  const memberships = ref<Membership[]>([]);
  const state = ref<LoadState>('idle');
  const error = ref<string | null>(null);

  const isSignedIn = computed(() => user.value !== null);

  function applySession(session: Session): void {
    user.value = session.user;
    memberships.value = session.memberships;
    state.value = 'done';
    error.value = null;
  }

  function clear(): void {
    user.value = null;
    memberships.value = [];
  }

  async function run(task: () => Promise<void>): Promise<void> {
    state.value = 'loading';
    error.value = null;
    try {
      await task();
      state.value = 'done';
    } catch (e) {
      state.value = 'error';
      error.value = e instanceof Error ? e.message : String(e);
      throw e;
    }
  }

  /** Rejects with the ApiClientError (e.g. `invalid_credentials`, `rate_limited`) so the form can show it. */
  function signIn(body: SignInBody): Promise<void> {
    return run(async () => applySession(await authApi.signIn(body)));
  }

  /** Forgets the user locally even when the server cannot be reached: a stale screen is worse. */
  async function signOut(): Promise<void> {
    try {
      await authApi.signOut();
    } finally {
      clear();
      state.value = 'done';
    }
  }

  /** 401 means "nobody signed in", a normal answer; only other failures count as errors. */
  async function fetchMe(): Promise<void> {
    try {
      await run(async () => applySession(await authApi.fetchMe()));
    } catch (e) {
      if (e instanceof ApiClientError && e.status === 401) {
        clear();
        state.value = 'done';
        error.value = null;
        return;
      }
      clear();
    }
  }

  /** Drops the local session without asking the server, for when the server already ended it. */
  function forget(): void {
    clear();
    state.value = 'done';
  }

  return { user, memberships, state, error, isSignedIn, applySession, signIn, signOut, fetchMe, forget };
});
