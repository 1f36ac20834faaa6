import '@fontsource/open-sans/latin-400.css';
import '@fontsource/open-sans/latin-600.css';
import '@fontsource/open-sans/latin-700.css';
import 'element-plus/theme-chalk/dark/css-vars.css';
import './styles/fonts.css';
import './styles/theme.css';
import './styles/base.css';
import './utils/zod-jitless';
import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './App.vue';
import { router } from './router';
import { startFirstPageData } from './utils/first-page-data';
import { followSystemColorScheme } from './utils/color-scheme';

followSystemColorScheme();

/**
 * Start fetching the first page's data and code now, alongside the session check the router waits for, rather
 * than one after the other: for the search and listing pages their API answer, and the page's chunk (a lazy route
 * component) for every page.
 */
function startFirstPage(): void {
  const first = router.resolve(window.location.pathname + window.location.search);
  startFirstPageData(first);
  for (const record of first.matched) {
    const component = record.components?.default;
    if (typeof component === 'function' && !('__vccOpts' in component) && !('props' in component))
      void (component as () => Promise<unknown>)();
  }
}
startFirstPage();

createApp(App).use(createPinia()).use(router).mount('#app');
