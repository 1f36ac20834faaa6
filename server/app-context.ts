import type { S3Client } from '@aws-sdk/client-s3';
import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type Stripe from 'stripe';
import type { DataSource, EntityManager } from 'typeorm';
import type { Config } from './config';
import type { RateLimits } from './features/auth/rate-limits';
import type { MailDispatcher } from './features/mail/mail-dispatcher';

/** The resources one app instance owns, handed to routers and services. */
export interface AppContext {
  config: Config;
  logger: Logger;
  dataSource: DataSource;
  rateLimits: RateLimits;
  mailTransport: Transporter;
  mailDispatcher: MailDispatcher;
  storage: S3Client;
  payments: Stripe;
  /** Run `work` in one database transaction, then let queued e-mail go out. */
  transaction<T>(work: (manager: EntityManager) => Promise<T>): Promise<T>;
}
