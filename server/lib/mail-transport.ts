import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config';

/** The SMTP connection: a local fake in development and tests, a real relay by configuration. */
export function createMailTransport(mail: Config['mail']): Transporter {
  return nodemailer.createTransport({
    host: mail.host,
    port: mail.port,
    secure: mail.secure,
    ignoreTLS: mail.ignoreTLS,
    auth: mail.user ? { user: mail.user, pass: mail.password ?? '' } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10_000,
  });
}
