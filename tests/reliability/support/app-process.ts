import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { loadServicesEnv } from '../../../infra-local/profile';
import { closedPort } from '../../support/tcp-proxy';

/**
 * The real server (server/index.ts, as `npm start` runs it) in a child process of its own, so a test can kill it
 * the way a crash or an out-of-memory killer would. Settings come from the test profile, with `env` on top.
 */
export interface AppProcess {
  url: string;
  child: ChildProcess;
  /** SIGKILL: no shutdown handler runs, nothing is flushed. */
  kill(): Promise<void>;
}

const ROOT = path.resolve(import.meta.dirname, '../../..');

/** `port`: where it listens (a free one unless given, e.g. when a webhook sender must know it in advance). */
export async function startAppProcess(
  env: Record<string, string>,
  timeoutMs = 30_000,
  port?: number,
): Promise<AppProcess> {
  port ??= await closedPort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      ...loadServicesEnv('test'),
      NODE_ENV: 'test',
      LOG_LEVEL: 'silent',
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
      ...env,
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_ORIGIN: url,
    },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const kill = async () => {
    if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
    await exited;
  };

  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited (${child.exitCode}) before listening: ${stderr}`);
    // Any answer means it listens; /api/health may well say 503 while a service is cut off on purpose.
    const answered = await fetch(`${url}/api/health`).then(
      () => true,
      () => false,
    );
    if (answered) return { url, child, kill };
    if (Date.now() > deadline) {
      await kill();
      throw new Error(`the app did not listen within ${timeoutMs} ms: ${stderr}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}
