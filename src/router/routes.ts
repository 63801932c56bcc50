import type { RouteComponent, RouteRecordRaw } from 'vue-router';
import { areaByKey, type AreaKey } from '@/navigation/areas';
import { HOME_PATH, NOT_PERMITTED_PATH, SIGN_IN_PATH } from './access';

type LazyView = () => Promise<{ default: RouteComponent }>;

// Views load on first visit so the map libraries do not weigh on the sign-in page.
const AREA_VIEWS: Record<AreaKey, LazyView> = {
  map: () => import('@/views/MapView.vue'),
  wells: () => import('@/views/WellsView.vue'),
  import: () => import('@/views/ImportView.vue'),
  prospects: () => import('@/views/ProspectsView.vue'),
  hazards: () => import('@/views/HazardsView.vue'),
  exports: () => import('@/views/ExportsView.vue'),
  team: () => import('@/views/TeamView.vue'),
  outbox: () => import('@/views/OutboxView.vue'),
};

/** Area routes take path, title and permission from the area table, so navigation and guards agree. */
const areaRoutes: RouteRecordRaw[] = (Object.keys(AREA_VIEWS) as AreaKey[]).map((key) => {
  const area = areaByKey(key);
  return {
    path: area.path.slice(1),
    name: key,
    component: AREA_VIEWS[key],
    meta: { action: area.action, title: area.label },
  };
});

/** Every route of the app. Anything not marked `public` needs a session. */
export const routes: RouteRecordRaw[] = [
  {
    path: SIGN_IN_PATH,
    name: 'sign-in',
    component: () => import('@/views/SignInView.vue'),
    meta: { public: true, guestOnly: true, title: 'Sign in' },
  },
  {
    path: '/accept-invite',
    name: 'accept-invite',
    component: () => import('@/views/AcceptInviteView.vue'),
    meta: { public: true, title: 'Join your team' },
  },
  {
    path: '/reset-password',
    name: 'reset-password',
    component: () => import('@/views/ResetPasswordView.vue'),
    meta: { public: true, title: 'Reset password' },
  },
  { path: '/forgot-password', redirect: (to) => ({ path: '/reset-password', query: to.query }) },
  {
    path: '/',
    component: () => import('@/components/app/AppShell.vue'),
    children: [
      { path: '', redirect: HOME_PATH },
      ...areaRoutes,
      {
        path: 'wells/:wellId',
        name: 'well-detail',
        component: () => import('@/views/WellDetailView.vue'),
        props: true,
        meta: { action: 'team.read', title: 'Well' },
      },
      {
        path: 'wells/:wellId/profile',
        name: 'well-profile',
        component: () => import('@/views/ProfileView.vue'),
        props: true,
        meta: { action: 'team.read', title: 'Pressure profile' },
      },
      {
        path: 'compare',
        name: 'compare',
        component: () => import('@/views/CompareView.vue'),
        meta: { action: 'team.read', title: 'Compare wells' },
      },
      {
        path: 'prospects/:prospectId/surfaces',
        name: 'prospect-surfaces',
        component: () => import('@/views/SurfaceView.vue'),
        props: true,
        meta: { action: 'team.read', title: 'Top-of-overpressure surface' },
      },
      {
        path: 'prospects/:prospectId/surfaces/:surfaceId',
        name: 'prospect-surface',
        component: () => import('@/views/SurfaceView.vue'),
        props: true,
        meta: { action: 'team.read', title: 'Top-of-overpressure surface' },
      },
      {
        path: NOT_PERMITTED_PATH.slice(1),
        name: 'not-permitted',
        component: () => import('@/views/NotPermittedView.vue'),
        meta: { title: 'Not permitted' },
      },
      {
        path: ':pathMatch(.*)*',
        name: 'not-found',
        component: () => import('@/views/NotFoundView.vue'),
        meta: { title: 'Page not found' },
      },
    ],
  },
];
