import { In, type DataSource } from 'typeorm';
import type { AppInstance } from '../../../server/app';
import { OutboundEmail } from '../../../server/features/mail/outbound-email.entity';

/** The outbox rows addressed to `addresses`, oldest first. */
export function outboxRows(dataSource: DataSource, addresses: string[]): Promise<OutboundEmail[]> {
  return dataSource.getRepository(OutboundEmail).find({ where: { toAddress: In(addresses) }, order: { id: 'ASC' } });
}

/** Wait until the dispatcher has tried (and so far failed) to send one e-mail to each address. */
export async function untilAttempted(
  app: AppInstance,
  addresses: string[],
  timeoutMs: number,
): Promise<OutboundEmail[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = await outboxRows(app.ctx.dataSource, addresses);
    const tried = addresses.every((a) => rows.some((r) => r.toAddress === a && r.attempts > 0));
    if (tried) return rows;
    if (Date.now() > deadline) throw new Error(`no send attempt for ${addresses.join(', ')} within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}
