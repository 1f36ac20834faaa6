import { fork } from 'node:child_process';
import path from 'node:path';

export interface BenchApp {
  url: string;
  stop(): Promise<void>;
}

/** Start bench-app.ts in a child process and wait (at most a minute) for the port it listens on. */
export function startBenchApp(): Promise<BenchApp> {
  const child = fork(path.join(import.meta.dirname, 'bench-app.ts'), [], {
    execArgv: ['--import', 'tsx'],
    // The request log goes nowhere: it still costs what it costs in production, without flooding the terminal.
    stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    if (child.connected) child.disconnect();
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    await exited;
    clearTimeout(timer);
  };
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      void stop();
      reject(new Error('the bench app did not start within 60 s'));
    }, 60_000);
    child.once('message', (message: { port: number }) => {
      clearTimeout(timer);
      resolve({ url: `http://127.0.0.1:${message.port}`, stop });
    });
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`the bench app exited (${code}) before listening`));
    });
  });
}
