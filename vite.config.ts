import { fileURLToPath, URL } from 'node:url';
import vue from '@vitejs/plugin-vue';
import AutoImport from 'unplugin-auto-import/vite';
import { ElementPlusResolver } from 'unplugin-vue-components/resolvers';
import Components from 'unplugin-vue-components/vite';
import { defineConfig } from 'vitest/config';

/** Import aliases shared by the client build and every test project. */
const alias = {
  '@': fileURLToPath(new URL('./client', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
};

/** The API server that the dev server and the preview server forward `/api` to. */
const apiProxy = { '/api': { target: 'http://127.0.0.1:8080', changeOrigin: false } };

export default defineConfig({
  plugins: [
    vue(),
    // Element Plus functions (ElMessage, ElMessageBox) with their styles, on demand.
    AutoImport({
      resolvers: [ElementPlusResolver()],
      dts: 'client/auto-imports.d.ts',
    }),
    // Element Plus components with their styles, on demand; our own components are imported explicitly.
    Components({
      resolvers: [ElementPlusResolver()],
      dirs: [],
      dts: 'client/components.d.ts',
    }),
  ],
  resolve: { alias },
  publicDir: 'client/public',
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    manifest: true,
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    strictPort: true,
    proxy: apiProxy,
  },
  preview: {
    host: '127.0.0.1',
    port: 4173,
    proxy: apiProxy,
  },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        extends: true,
        test: {
          name: 'client',
          include: ['tests/client/**/*.test.ts'],
          environment: 'happy-dom',
          server: { deps: { inline: ['element-plus'] } },
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'server',
          include: [
            'tests/server/**/*.test.ts',
            'tests/contract/**/*.test.ts',
            'tests/security/**/*.test.ts',
            'tests/reliability/**/*.test.ts',
            'tests/budgets/**/*.test.ts',
          ],
          environment: 'node',
          fileParallelism: false,
          globalSetup: ['tests/support/global-setup.ts'],
          // Runs beside the browser project on two cores: starting an app can take seconds under that load.
          hookTimeout: 60_000,
          testTimeout: 30_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          globalSetup: ['tests/support/browser-setup.ts'],
          testTimeout: 60_000,
          // The photo bucket the browser tests' app serves (tests/support/browser-setup.ts), so their data shows.
          env: { TEST_S3_BUCKET: 'benchwright-photos-browser' }, // BROWSER_PHOTO_BUCKET in tests/support/test-env.ts
        },
      },
    ],
  },
});
