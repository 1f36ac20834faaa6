import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';

export const EMAIL_STATES = ['pending', 'sent', 'failed'] as const;
export type EmailState = (typeof EMAIL_STATES)[number];

/**
 * An e-mail waiting to be sent or already sent (a transactional outbox): it is written in the
 * same transaction as the change it reports, then delivered by the mail dispatcher, so a crash
 * or an SMTP outage neither loses it nor sends it twice.
 */
@Entity({ name: 'outbound_emails' })
@Index('ix_outbound_emails_state_due', ['state', 'nextAttemptAt'])
export class OutboundEmail {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 200 })
  subject: string;

  @Column({ name: 'text_body', type: 'text' })
  textBody: string;

  @Column({ name: 'html_body', type: 'text' })
  htmlBody: string;

  @Column({ type: 'enum', enum: EMAIL_STATES, default: 'pending' })
  state: EmailState;

  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'next_attempt_at', type: 'datetime', precision: 3 })
  nextAttemptAt: Date;

  @Column({ name: 'sent_at', type: 'datetime', precision: 3, nullable: true })
  sentAt: Date | null;

  @CreatedAtColumn()
  createdAt: Date;
}
