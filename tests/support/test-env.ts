import { loadServicesEnv } from '../../infra-local/profile';
import { loadConfig, type Config } from '../../server/config';

/** The test profile's services (started by `npm test`), as process environment. */
export function applyTestEnv(): void {
  Object.assign(process.env, loadServicesEnv('test'), {
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? 'silent',
  });
}

let counter = 0;

/** Configuration for one in-process test app; rate-limit counters are private to it. */
export function testConfig(overrides: Partial<Config> = {}): Config {
  applyTestEnv();
  counter += 1;
  const base = loadConfig(process.env);
  return { ...base, rateLimitNamespace: `t${process.pid}-${Date.now()}-${counter}`, ...overrides };
}
