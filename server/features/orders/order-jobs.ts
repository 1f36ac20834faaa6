import type { AppContext } from '../../app-context';
import { orderLapseJob } from './order-lapse.job';
import { orderAutoConfirmJob, orderMoneySweepJob } from './order-auto-confirm.job';

/** A piece of background work run on a timer. `run` must be safe to run in several app processes at once. */
export interface OrderJob {
  name: string;
  everyMs: number;
  /** Does what is due now; answers how many records it acted on. */
  run(ctx: AppContext): Promise<number>;
}

/** Every order job; add a job by appending it here. */
export const ORDER_JOBS: readonly OrderJob[] = [orderLapseJob, orderAutoConfirmJob, orderMoneySweepJob];

/**
 * Runs each order job every `everyMs`, one run of a job at a time. Jobs take row locks (SKIP LOCKED) so two app
 * processes never act on the same order; a failed run is logged and the job runs again on its next turn.
 */
export class OrderJobRunner {
  private readonly timers = new Map<string, NodeJS.Timeout>();
  private readonly running = new Map<string, Promise<void>>();
  private stopped = true;

  constructor(
    private readonly ctx: AppContext,
    private readonly jobs: readonly OrderJob[] = ORDER_JOBS,
  ) {}

  start(): void {
    this.stopped = false;
    for (const job of this.jobs) this.schedule(job, job.everyMs);
  }

  async stop(): Promise<void> {
    this.stopped = true;
    for (const timer of this.timers.values()) clearTimeout(timer);
    this.timers.clear();
    await Promise.all(this.running.values());
  }

  /** Run one job now (tests, and a nudge after a change); waits for a run already under way first. */
  async runNow(name: string): Promise<number> {
    const job = this.jobs.find((j) => j.name === name);
    if (!job) throw new Error(`no order job called ${name}`);
    await this.running.get(name);
    return job.run(this.ctx);
  }

  private schedule(job: OrderJob, delay: number): void {
    const timer = setTimeout(() => void this.tick(job), delay);
    timer.unref();
    this.timers.set(job.name, timer);
  }

  private async tick(job: OrderJob): Promise<void> {
    if (this.stopped) return;
    const run = job
      .run(this.ctx)
      .then(() => undefined)
      .catch((error: unknown) => this.ctx.logger.error({ err: error, job: job.name }, 'order job failed'));
    this.running.set(job.name, run);
    await run;
    this.running.delete(job.name);
    if (!this.stopped) this.schedule(job, job.everyMs);
  }
}
