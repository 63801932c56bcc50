import { createRouter, createWebHistory, type Router, type RouterHistory } from 'vue-router';
import { useSessionStore } from '@/stores/session';
import { useTeamStore } from '@/stores/team';
import { decideAccess } from './access';
import { routes } from './routes';

/**
 * The app router with its guards. Pinia must be installed (or active) before the first navigation.
 * @example const router = createAppRouter(createMemoryHistory()); await router.push('/team');
 */
export function createAppRouter(history: RouterHistory = createWebHistory()): Router {
  const router = createRouter({ history, routes, scrollBehavior: () => ({ top: 0 }) });

  router.beforeEach(async (to) => {
    const session = useSessionStore();
    // The first navigation asks the server whether the cookie still holds a session.
    if (session.state === 'idle') await session.fetchMe();
    return decideAccess(to, { signedIn: session.isSignedIn, can: (action) => useTeamStore().can(action) });
  });

  router.afterEach((to) => {
    if (typeof document !== 'undefined') {
      document.title = to.meta.title ? `${to.meta.title} · Porelith` : 'Porelith';
    }
  });

  return router;
}
