import type { Logger } from 'pino';
import type { Transporter } from 'nodemailer';
import { type DataSource, LessThanOrEqual } from 'typeorm';
import { OutboundEmail } from './outbound-email.entity';

const BATCH_SIZE = 10;
const POLL_MS = 2000;
const MAX_ATTEMPTS = 10;
const MAX_BACKOFF_MS = 15 * 60_000;

/**
 * Sends queued e-mail. Rows are claimed with SKIP LOCKED inside a transaction, so several app
 * processes can run a dispatcher without sending a message twice; a failed send is retried
 * with growing delays, and given up after MAX_ATTEMPTS.
 */
export class MailDispatcher {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private again = false;
  private stopped = true;

  constructor(
    private readonly dataSource: DataSource,
    private readonly transport: Transporter,
    private readonly from: string,
    private readonly logger: Logger,
  ) {}

  start(): void {
    this.stopped = false;
    this.schedule(0);
  }

  /** Ask for a run soon, e.g. right after a transaction that queued mail has committed. */
  nudge(): void {
    if (this.stopped) return;
    if (this.running) this.again = true;
    else this.schedule(0);
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    await this.running;
  }

  /** Send everything due now; resolves with the number sent. Used by the loop and by tests. */
  async sendDue(): Promise<number> {
    let sent = 0;
    for (;;) {
      const batch = await this.dataSource.transaction(async (manager) => {
        const due = await manager.getRepository(OutboundEmail).find({
          where: { state: 'pending', nextAttemptAt: LessThanOrEqual(new Date()) },
          order: { id: 'ASC' },
          take: BATCH_SIZE,
          lock: { mode: 'pessimistic_write', onLocked: 'skip_locked' },
        });
        for (const email of due) {
          if (await this.deliver(email)) sent += 1;
          await manager.save(email);
        }
        return due.length;
      });
      if (batch < BATCH_SIZE) return sent;
    }
  }

  private async deliver(email: OutboundEmail): Promise<boolean> {
    email.attempts += 1;
    try {
      await this.transport.sendMail({
        from: this.from,
        to: email.toAddress,
        subject: email.subject,
        text: email.textBody,
        html: email.htmlBody,
      });
      email.state = 'sent';
      email.sentAt = new Date();
      email.lastError = null;
      return true;
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      email.lastError = message.slice(0, 500);
      email.state = email.attempts >= MAX_ATTEMPTS ? 'failed' : 'pending';
      email.nextAttemptAt = new Date(Date.now() + Math.min(2 ** email.attempts * 1000, MAX_BACKOFF_MS));
      this.logger.warn({ emailId: email.id, attempts: email.attempts, err: message }, 'e-mail not sent yet');
      return false;
    }
  }

  private schedule(delay: number): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.tick(), delay);
    this.timer.unref();
  }

  private async tick(): Promise<void> {
    if (this.stopped || this.running) return;
    this.running = this.sendDue()
      .then(() => undefined)
      .catch((error: unknown) => this.logger.error({ err: error }, 'mail dispatcher run failed'));
    await this.running;
    this.running = null;
    if (this.stopped) return;
    const rerun = this.again;
    this.again = false;
    this.schedule(rerun ? 0 : POLL_MS);
  }
}
