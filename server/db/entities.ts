import { AuditEvent } from '../features/audit/audit-event.entity';
import { OneTimeToken } from '../features/auth/one-time-token.entity';
import { OutboundEmail } from '../features/mail/outbound-email.entity';
import { User } from '../features/users/user.entity';

/** Every entity, listed once so the data source and tests agree. */
export const entities = [User, OneTimeToken, AuditEvent, OutboundEmail];
