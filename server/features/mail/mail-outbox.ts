import type { EntityManager } from 'typeorm';
import type { EmailContent } from './mail-templates';
import { OutboundEmail } from './outbound-email.entity';

/** Queue an e-mail in the caller's transaction; the dispatcher sends it once that transaction commits. */
export async function enqueueEmail(manager: EntityManager, to: string, content: EmailContent): Promise<void> {
  await manager.insert(OutboundEmail, {
    toAddress: to,
    subject: content.subject,
    textBody: content.text,
    htmlBody: content.html,
    state: 'pending',
    nextAttemptAt: new Date(),
  });
}
