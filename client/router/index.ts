import { createRouter, createWebHistory } from 'vue-router';
import { installGuards } from './guards';
import { routes } from './routes';

/** The client's router: HTML5 history, top of the page on each new page, guards attached. */
export const router = createRouter({
  history: createWebHistory(import.meta.env.BASE_URL),
  routes,
  scrollBehavior(to, _from, savedPosition) {
    if (savedPosition) return savedPosition;
    if (to.hash) return { el: to.hash };
    return { top: 0 };
  },
});

installGuards(router);
