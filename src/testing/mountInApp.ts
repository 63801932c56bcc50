import { defineComponent, h, type Component } from 'vue';
import { mount } from '@vue/test-utils';
import { createPinia, setActivePinia, type Pinia } from 'pinia';
import { NDialogProvider, NMessageProvider } from 'naive-ui';
import { createAppRouter } from '@/router';
import { createMemoryHistory, type Router } from 'vue-router';

/**
 * Mounts a component the way the app runs it: Pinia, the real router (memory history) and the
 * Naive UI message/dialog providers that `useMessage`/`useDialog` need.
 * @example const { wrapper, router } = await mountInApp(SignInForm, { path: '/sign-in' });
 */
export async function mountInApp(component: Component, options: { props?: Record<string, unknown>; path?: string; pinia?: Pinia } = {}) {
  const pinia = options.pinia ?? createPinia();
  setActivePinia(pinia);
  const router: Router = createAppRouter(createMemoryHistory());
  await router.push(options.path ?? '/sign-in');
  await router.isReady();
  const Host = defineComponent({
    render: () => h(NMessageProvider, () => h(NDialogProvider, () => h(component, options.props ?? {}))),
  });
  const wrapper = mount(Host, { global: { plugins: [pinia, router] }, attachTo: document.body });
  return { wrapper, router, pinia };
}
