import { loadServicesEnv } from '../../infra-local/profile';
import { loadConfig, type Config } from '../../server/config';

/** The test profile's services (started by `npm test`), as process environment. */
export function applyTestEnv(): void {
  Object.assign(process.env, loadServicesEnv('test'), {
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? 'silent',
  });
  // The browser tests use a photo bucket of their own (see vite.config.ts), so server tests that compare the whole
  // bucket before and after never see their uploads.
  if (process.env.TEST_S3_BUCKET) process.env.S3_BUCKET = process.env.TEST_S3_BUCKET;
}

/** The browser tests' photo bucket: the app they drive serves it, and their own arrange steps write to it. */
export const BROWSER_PHOTO_BUCKET = 'benchwright-photos-browser';

let counter = 0;

/** Configuration for one in-process test app; rate-limit counters are private to it. */
export function testConfig(overrides: Partial<Config> = {}): Config {
  applyTestEnv();
  counter += 1;
  const base = loadConfig(process.env);
  return { ...base, rateLimitNamespace: `t${process.pid}-${Date.now()}-${counter}`, ...overrides };
}
