// What a local service is, and how one is started (or reused), checked and stopped.
import type { ChildProcess } from 'node:child_process';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { PORTS, profilePaths, REPO_ROOT, type Profile, type ProfilePaths } from './profile';
import {
  isAlive,
  isOurProcess,
  portAnswers,
  readPidFile,
  removeFile,
  spawnDetached,
  stopProcess,
  tailFile,
  writePidFile,
} from './processes';

export const SERVICE_NAMES = ['mariadb', 's3', 'mail', 'payments'] as const;
export type ServiceName = (typeof SERVICE_NAMES)[number];

export function isServiceName(value: string): value is ServiceName {
  return (SERVICE_NAMES as readonly string[]).includes(value);
}

/** What down and status need: no secrets, no side effects. */
export interface ServiceIdentity {
  name: ServiceName;
  ports: number[];
  /** A path unique to this service and profile that appears on its command line. */
  marker: string;
  pidFile: string;
  logFile: string;
}

export interface ServiceDefinition extends ServiceIdentity {
  /** Before spawning: install, initialise data. */
  prepare?(): Promise<void>;
  command(): { command: string; args: string[] };
  /** Readiness check used instead of "its ports accept a connection". */
  isReady?(): Promise<boolean>;
  /** After it is ready, on every `up` (so it must be idempotent): databases, buckets. */
  configure?(): Promise<void>;
}

export function serviceIdentity(profile: Profile, name: ServiceName): ServiceIdentity {
  const paths = profilePaths(profile);
  const ports = PORTS[profile];
  const byName: Record<ServiceName, { ports: number[]; marker: string }> = {
    mariadb: { ports: [ports.mariadb], marker: paths.mariadbData },
    s3: { ports: [ports.s3], marker: paths.s3 },
    mail: { ports: [ports.smtp, ports.inbox], marker: paths.mailStore },
    payments: { ports: [ports.payments], marker: paths.paymentsState },
  };
  return {
    name,
    ...byName[name],
    pidFile: path.join(paths.pids, `${name}.pid`),
    logFile: path.join(paths.logs, `${name}.log`),
  };
}

export interface UpContext {
  profile: Profile;
  paths: ProfilePaths;
}

const READY_TIMEOUT_MS = 30_000;

async function answersAll(service: ServiceDefinition): Promise<boolean> {
  if (service.isReady) return service.isReady(); // it connects anyway; a bare probe only adds log noise
  const answers = await Promise.all(service.ports.map((port) => portAnswers(port)));
  return answers.every(Boolean);
}

async function waitUntilReady(service: ServiceDefinition, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  // Checks at least once after the deadline: a synchronous apt-get elsewhere can eat the whole wait.
  for (;;) {
    const late = Date.now() > deadline;
    if (child.exitCode !== null || child.signalCode !== null) {
      throw new Error(
        `${service.name} exited (${child.exitCode ?? child.signalCode}) while starting; ${service.logFile} ends with:\n${tailFile(service.logFile)}`,
      );
    }
    if (await answersAll(service)) return;
    if (late) break;
    await sleep(200);
  }
  throw new Error(
    `${service.name} did not answer on 127.0.0.1:${service.ports.join(',')} within ${READY_TIMEOUT_MS / 1000} s; ${service.logFile} ends with:\n${tailFile(service.logFile)}`,
  );
}

/**
 * Reuses the service if its pid file names our live process and it answers; otherwise
 * starts it detached. Calls onStarted as soon as a process was spawned.
 */
export async function ensureRunning(
  service: ServiceDefinition,
  onStarted: (name: ServiceName) => void,
): Promise<'reused' | 'started'> {
  const pid = readPidFile(service.pidFile);
  if (pid !== null && isOurProcess(pid, service.marker)) {
    if (await answersAll(service)) {
      await service.configure?.();
      console.log(`${service.name}: reused (pid ${pid})`);
      return 'reused';
    }
    console.log(`${service.name}: pid ${pid} does not answer, restarting it`);
    await stopProcess(pid);
  }
  removeFile(service.pidFile);

  for (const port of service.ports) {
    if (await portAnswers(port)) {
      throw new Error(
        `${service.name}: 127.0.0.1:${port} is taken by a process services.ts did not start (see \`ss -ltnp 'sport = :${port}'\`)`,
      );
    }
  }
  await service.prepare?.();
  const { command, args } = service.command();
  const child = spawnDetached({ command, args, logFile: service.logFile, cwd: REPO_ROOT });
  if (child.pid === undefined) throw new Error(`${service.name}: could not spawn ${command}`);
  writePidFile(service.pidFile, child.pid);
  onStarted(service.name);
  await waitUntilReady(service, child);
  await service.configure?.();
  console.log(`${service.name}: started (pid ${child.pid}) on 127.0.0.1:${service.ports.join(',')}`);
  return 'started';
}

export async function stopService(service: ServiceIdentity): Promise<string> {
  const pid = readPidFile(service.pidFile);
  removeFile(service.pidFile);
  if (pid === null) return 'not running';
  if (!isOurProcess(pid, service.marker)) return `stale pid file (pid ${pid}) removed`;
  const killed = await stopProcess(pid);
  if (isAlive(pid)) throw new Error(`${service.name}: pid ${pid} survived SIGKILL`);
  return killed ? `killed (pid ${pid}) after 10 s` : `stopped (pid ${pid})`;
}

export async function describe(service: ServiceIdentity): Promise<{ running: boolean; text: string }> {
  const pid = readPidFile(service.pidFile);
  const ours = pid !== null && isOurProcess(pid, service.marker);
  const ports = await Promise.all(
    service.ports.map(async (port) => `${port} ${(await portAnswers(port)) ? 'answers' : 'silent'}`),
  );
  const state = ours ? `running (pid ${pid})` : pid !== null ? `stale pid file (pid ${pid})` : 'stopped';
  return { running: ours, text: `${service.name.padEnd(9)} ${state.padEnd(27)} 127.0.0.1: ${ports.join(', ')}` };
}
