import { spawn } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { testConfig } from '../support/test-env';

const PORT = 8097;

async function waitForHealth(url: string, deadline: number): Promise<number> {
  for (;;) {
    try {
      return (await fetch(url)).status;
    } catch {
      if (Date.now() > deadline) throw new Error(`${url} did not answer`);
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
  }
}

describe('server process', () => {
  it('stops on SIGTERM with exit code 0', async () => {
    testConfig(); // loads the test services' environment into process.env
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
      env: { ...process.env, PORT: String(PORT), APP_ORIGIN: `http://127.0.0.1:${PORT}`, LOG_LEVEL: 'silent' },
      stdio: 'ignore',
    });
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));

    expect(await waitForHealth(`http://127.0.0.1:${PORT}/api/health`, Date.now() + 20_000)).toBe(200);
    child.kill('SIGTERM');

    expect(await exited).toBe(0);
  }, 30_000);
});
