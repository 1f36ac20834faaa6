import { randomBytes } from 'node:crypto';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { moduleBody, publishListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';
import { testConfig } from '../support/test-env';
import { createPrivateDatabase, type PrivateDatabase } from '../reliability/support/private-database';
import {
  headerLines,
  startSmtpCapture,
  type CapturedMessage,
  type SmtpCapture,
} from '../reliability/support/smtp-capture';

/**
 * Text that people type and that reaches an e-mail — a display name in the greeting, a listing title and a saved
 * search name in subjects, an address in the envelope — carries CR/LF and a `Bcc:` line. Either validation refuses
 * it, or the message that reaches the SMTP server still has one recipient and no header the app did not write
 * (OWASP Testing Guide, "Testing for IMAP SMTP Injection"). Messages go to a private SMTP server that keeps the raw
 * bytes, from an app on a private database, so no other test's dispatcher sends them elsewhere.
 */
const INTRUDER = 'intruder@example.test';
const INJECTION = `\r\nBcc: ${INTRUDER}\r\nX-Injected: yes`;
/** Every header the app's messages may carry (nodemailer writes these; the app sets from, to, subject). */
const ALLOWED_HEADERS = ['from', 'to', 'subject', 'message-id', 'date', 'mime-version', 'content-type'];

let database: PrivateDatabase;
let capture: SmtpCapture;
let app: AppInstance;
let moderator: User;

beforeAll(async () => {
  database = await createPrivateDatabase('mail');
  capture = await startSmtpCapture();
  const { mail } = testConfig();
  app = await startTestApp({ db: database.db, mail: { ...mail, host: '127.0.0.1', port: capture.port } });
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
}, 60_000);
afterAll(async () => {
  await app?.close();
  await capture?.close();
  await database?.drop();
});

/** The message reached only `recipient`, with only the headers the app writes, and no injected line. */
async function expectClean(message: CapturedMessage, recipient: string) {
  expect(message.envelopeTo).toEqual([recipient]);
  // The body may well show the typed text (quoted-printable can even start a line with it); the headers may not.
  const names = headerLines(message.raw).map((line) => line.slice(0, line.indexOf(':')).toLowerCase());
  expect(names.filter((n) => !ALLOWED_HEADERS.includes(n))).toEqual([]);
  const parsed = await simpleParser(message.raw);
  expect(parsed.bcc).toBeUndefined();
  expect(parsed.cc).toBeUndefined();
  expect(parsed.headers.has('x-injected')).toBe(false);
  expect([parsed.to].flat().flatMap((t) => t!.value.map((v) => v.address))).toEqual([recipient]);
}

afterAll(() => {
  // Whatever happened above, nothing may have gone to the address in the injected line.
  expect(capture.messages.flatMap((m) => m.envelopeTo)).not.toContain(INTRUDER);
});

describe('e-mail header injection', () => {
  it('keeps a display name with a Bcc line out of the headers of the sign-up e-mail', async () => {
    const email = uniqueEmail('joiner');
    const agent = await browserLikeAgent(app);

    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email, displayName: `Ada Baseboard${INJECTION}`, password: GOOD_PASSWORD });

    expect(res.status).toBe(202);
    const message = await capture.waitFor(new RegExp(`^To: ${email}`, 'im'));
    await expectClean(message, email);
    expect(message.raw).toMatch(/Hello Ada Baseboard Bcc: intruder@example\.test X-Injected: yes,/);
  });

  it('refuses an address with a line break at sign-up and in an address change', async () => {
    const agent = await browserLikeAgent(app);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .send({ email: `${uniqueEmail()}${INJECTION}`, displayName: 'Bea Batten', password: GOOD_PASSWORD });
    const member = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const change = await member
      .post('/api/account/email')
      .send({ newEmail: `${uniqueEmail()}${INJECTION}`, currentPassword: GOOD_PASSWORD });

    for (const res of [signUp, change]) {
      expect(res.status).toBe(422);
      expect(res.body.error.code).toBe('validation_failed');
    }
    expect(signUp.body.error.fields.email).toBe('Enter an e-mail address like name@example.org.');
    expect(change.body.error.fields.newEmail).toBe('Enter an e-mail address like name@example.org.');
  });

  it('keeps a listing title and a saved search name with Bcc lines to one subject line', async () => {
    const token = `qx${randomBytes(5).toString('hex')}`;
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Cyril Purlin' });
    const buyerAgent = await signedInAs(app, buyer);
    await buyerAgent
      .post('/api/saved-searches')
      .send({ name: `Yard finds${INJECTION}`, query: { q: token } })
      .expect(201);
    const seller = await buildUser(app.ctx.dataSource);
    const created = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send(moduleBody({ title: `Goods yard ${token}${INJECTION}` }));
    expect(created.status).toBe(201);
    const listing = await app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: created.body.listing.id });
    expect(listing.title).toBe(`Goods yard ${token} Bcc: ${INTRUDER} X-Injected: yes`);

    await publishListing(app.ctx, listing, seller, moderator);

    const live = await capture.waitFor(new RegExp(`^To: ${seller.email}`, 'im'));
    await expectClean(live, seller.email);
    expect((await simpleParser(live.raw)).subject).toBe(`Your listing is live: ${listing.title}`);
    const alert = await capture.waitFor(new RegExp(`^To: ${buyer.email}`, 'im'));
    await expectClean(alert, buyer.email);
    expect((await simpleParser(alert.raw)).subject).toBe(
      `New on Benchwright for "Yard finds Bcc: ${INTRUDER} X-Injected: yes": ${listing.title}`,
    );
  });
});
