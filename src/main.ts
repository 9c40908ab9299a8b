import { createApp } from 'vue';
import { createPinia } from 'pinia';
// Vuetify's styles first: they declare the cascade layers the app's own CSS slots into.
import { vuetify } from './plugins/vuetify';
import '@fontsource/barlow/400.css';
import '@fontsource/barlow/500.css';
import '@fontsource/barlow/600.css';
import '@fontsource/barlow/700.css';
import App from './App.vue';
import { apiKey, createApi } from './api';
import { createHttp } from './api/http';
import { createAppRouter } from './router';
import { useSessionStore } from './stores/session';

const app = createApp(App);
const pinia = createPinia();
app.use(pinia);

const router = createAppRouter(pinia);

const http = createHttp({
  csrfToken: () => useSessionStore(pinia).csrfToken,
  refreshCsrfToken: () => useSessionStore(pinia).refreshCsrfToken(),
  onUnauthenticated: () => {
    const session = useSessionStore(pinia);
    if (!session.signedIn) return;
    // The session ended on the server (expired, signed out elsewhere): back to sign-in, then back here.
    session.forget();
    const here = router.currentRoute.value;
    if (!here.meta.public) void router.push({ name: 'sign-in', query: { next: here.fullPath, expired: '1' } });
  },
});
app.provide(apiKey, createApi(http));

app.use(router);
app.use(vuetify);
app.mount('#app');
