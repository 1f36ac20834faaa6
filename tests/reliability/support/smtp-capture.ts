import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

/**
 * A private SMTP server on a loopback port that keeps each message exactly as it arrived: the envelope (every
 * real recipient, Bcc included) and the raw bytes, headers and all. The shared mail fake keeps only parsed fields,
 * which would hide an injected header.
 */
export interface CapturedMessage {
  envelopeTo: string[];
  raw: string;
}

export interface SmtpCapture {
  port: number;
  messages: CapturedMessage[];
  /** Wait for a message whose raw text matches `pattern`. */
  waitFor(pattern: RegExp, timeoutMs?: number): Promise<CapturedMessage>;
  close(): Promise<void>;
}

export async function startSmtpCapture(): Promise<SmtpCapture> {
  const messages: CapturedMessage[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    disableReverseLookup: true,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        messages.push({
          envelopeTo: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(chunks).toString('utf8'),
        });
        callback();
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.server.address() as AddressInfo;
  return {
    port,
    messages,
    async waitFor(pattern, timeoutMs = 15_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const found = messages.find((m) => pattern.test(m.raw));
        if (found) return found;
        if (Date.now() > deadline) throw new Error(`no message matching ${pattern} within ${timeoutMs} ms`);
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** The header block of a raw message: everything before the first empty line, continuation lines unfolded. */
export function headerLines(raw: string): string[] {
  const block = raw.split(/\r?\n\r?\n/, 1)[0] ?? '';
  return block.replace(/\r?\n[ \t]+/g, ' ').split(/\r?\n/);
}
