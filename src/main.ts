import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/inter/700.css';
import './assets/base.css';

import { createApp } from 'vue';
import { createPinia } from 'pinia';
import App from './App.vue';
import { onSessionExpired } from './api/client';
import { createAppRouter } from './router';
import { SIGN_IN_PATH } from './router/access';
import { useSessionStore } from './stores/session';

const app = createApp(App);
const pinia = createPinia();
app.use(pinia);
const router = createAppRouter();
app.use(router);

// A session that ends mid-use (expired, signed out elsewhere) returns the person to sign-in, then back here.
onSessionExpired(() => {
  useSessionStore(pinia).forget();
  const here = router.currentRoute.value;
  if (!here.meta.public) void router.replace({ path: SIGN_IN_PATH, query: { next: here.fullPath } });
});

// Mount after the first guard has asked the server about the session, so no page flashes before redirecting.
void router.isReady().then(() => app.mount('#app'));
