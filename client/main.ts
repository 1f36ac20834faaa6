import '@fontsource/open-sans/latin-400.css';
import '@fontsource/open-sans/latin-600.css';
import '@fontsource/open-sans/latin-700.css';
import 'element-plus/theme-chalk/dark/css-vars.css';
import './styles/theme.css';
import './styles/base.css';
import { createPinia } from 'pinia';
import { createApp } from 'vue';
import App from './App.vue';
import { router } from './router';
import { followSystemColorScheme } from './utils/color-scheme';

followSystemColorScheme();

createApp(App).use(createPinia()).use(router).mount('#app');
