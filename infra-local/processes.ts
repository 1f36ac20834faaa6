// Detached processes, pid files, ports and a per-profile lock.
import { spawn, type ChildProcess } from 'node:child_process';
import { closeSync, linkSync, mkdirSync, openSync, readFileSync, rmSync, writeFileSync, writeSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { HOST } from './profile';

export function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
  // An unreaped zombie still answers kill(0); it is dead for our purposes.
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) !== 'Z';
  } catch {
    return true;
  }
}

/**
 * True when pid is alive and its command line contains `marker` (a path unique to the
 * service and profile), so a pid file left over from before a reboot cannot make us
 * reuse or kill an unrelated process that got the same pid.
 */
export function isOurProcess(pid: number, marker: string): boolean {
  if (!isAlive(pid)) return false;
  try {
    return readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0').join(' ').includes(marker);
  } catch {
    return true; // no /proc (not Linux): trust the pid file
  }
}

export function readPidFile(file: string): number | null {
  try {
    const pid = Number.parseInt(readFileSync(file, 'utf8').trim(), 10);
    return Number.isInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

export function writePidFile(file: string, pid: number): void {
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, `${pid}\n`);
}

export function removeFile(file: string): void {
  rmSync(file, { force: true });
}

export function portAnswers(port: number, timeoutMs = 500): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ host: HOST, port });
    const done = (answered: boolean) => {
      socket.destroy();
      resolve(answered);
    };
    socket.setTimeout(timeoutMs, () => done(false));
    socket.once('connect', () => done(true));
    socket.once('error', () => done(false));
  });
}

export interface DetachedSpawn {
  command: string;
  args: string[];
  logFile: string;
  cwd: string;
  env?: NodeJS.ProcessEnv;
}

/** Starts a process in its own process group, output appended to logFile; it outlives us. */
export function spawnDetached({ command, args, logFile, cwd, env }: DetachedSpawn): ChildProcess {
  mkdirSync(path.dirname(logFile), { recursive: true });
  const fd = openSync(logFile, 'a');
  try {
    writeSync(fd, `\n--- ${new Date().toISOString()} ${command} ${args.join(' ')}\n`);
    const child = spawn(command, args, {
      cwd,
      env: env ?? process.env,
      detached: true,
      stdio: ['ignore', fd, fd],
    });
    child.unref();
    return child;
  } finally {
    closeSync(fd);
  }
}

function signal(pid: number, sig: NodeJS.Signals): void {
  try {
    process.kill(-pid, sig); // the whole group: tsx or s3rver children go too
  } catch {
    try {
      process.kill(pid, sig);
    } catch {
      // already gone
    }
  }
}

/** SIGTERM, up to timeoutMs for it to exit, then SIGKILL. Resolves true if it had to kill. */
export async function stopProcess(pid: number, timeoutMs = 10_000): Promise<boolean> {
  signal(pid, 'SIGTERM');
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (!isAlive(pid)) return false;
    await sleep(100);
  }
  signal(pid, 'SIGKILL');
  for (let i = 0; i < 50 && isAlive(pid); i++) await sleep(100);
  return true;
}

export function tailFile(file: string, lines = 30): string {
  try {
    return readFileSync(file, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log)';
  }
}

/** Serialises `up`/`down` of one profile across processes. Returns the release function. */
export async function acquireLock(file: string, timeoutMs = 180_000): Promise<() => void> {
  mkdirSync(path.dirname(file), { recursive: true });
  const deadline = Date.now() + timeoutMs;
  let announced = false;
  for (;;) {
    // link() creates the lock atomically with its content, so no one reads it half-written.
    const temp = `${file}.${process.pid}`;
    writeFileSync(temp, `${process.pid}\n`);
    try {
      linkSync(temp, file);
      return () => removeFile(file);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    } finally {
      removeFile(temp);
    }
    const holder = readPidFile(file);
    if (holder === null || !isAlive(holder)) {
      removeFile(file);
      continue;
    }
    if (Date.now() > deadline) throw new Error(`${file} is held by pid ${holder}; gave up waiting`);
    if (!announced) console.log(`waiting for pid ${holder} (another services.ts) to finish…`);
    announced = true;
    await sleep(250);
  }
}
