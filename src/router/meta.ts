import 'vue-router';
import type { Action } from '@shared/auth/permissions';

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without a session. */
    public?: boolean;
    /** Only for people who are not signed in (the sign-in page); others are sent on. */
    guestOnly?: boolean;
    /** Permission needed in the current team. */
    action?: Action;
    /** Shown in the browser tab. */
    title?: string;
  }
}

export {};
