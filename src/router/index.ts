import type { Pinia } from 'pinia';
import { createRouter, createWebHistory, type Router } from 'vue-router';
import { installGuards } from './guards';
import { routes } from './routes';

export type { RouteName, RouteNamedMap } from './routes';

export function createAppRouter(pinia: Pinia): Router {
  const router = createRouter({
    history: createWebHistory(import.meta.env.BASE_URL),
    routes,
    scrollBehavior: (_to, _from, saved) => saved ?? { top: 0 },
  });
  installGuards(router, pinia);
  return router;
}
