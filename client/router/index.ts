import { createRouter, createWebHistory } from 'vue-router';
import { installGuards } from './guards';
import { routes } from './routes';

/** The client's router: HTML5 history, top of the page on each new page (not on a new query), guards attached. */
export const router = createRouter({
  history: createWebHistory(import.meta.env.BASE_URL),
  routes,
  scrollBehavior(to, from, savedPosition) {
    if (savedPosition) return savedPosition;
    if (to.hash) return { el: to.hash };
    // Only the query changed (a filter, the order, a tab): stay where the person was reading.
    if (to.path === from.path && from.matched.length > 0) return false;
    return { top: 0 };
  },
});

installGuards(router);
