import { PDFDocument, PDFRawStream, decodePDFRawStream } from 'pdf-lib';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { buildOrder } from '../support/order-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let buyer: User;
let seller: User;
let buyerAgent: TestAgent;
let sellerAgent: TestAgent;

beforeAll(async () => {
  app = await startTestApp();
  buyer = await buildUser(app.ctx.dataSource, { displayName: 'Marsh Lane Modellers' });
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Tollgate Benchwork' });
  buyerAgent = await signedInAs(app, buyer);
  sellerAgent = await signedInAs(app, seller);
}, 60_000);
afterAll(() => app.close());

/** Download a receipt and read back its title and the text drawn on its page (hex strings of Tj operators). */
async function receipt(agent: TestAgent, orderId: number) {
  const res = await agent
    .get(`/api/orders/${orderId}/receipt.pdf`)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    })
    .expect(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  expect(res.headers['content-disposition']).toBe(`attachment; filename="benchwright-order-${orderId}-receipt.pdf"`);
  const doc = await PDFDocument.load(res.body as Buffer);
  const streams = doc.context
    .enumerateIndirectObjects()
    .flatMap(([, object]) => (object instanceof PDFRawStream ? [decodePDFRawStream(object).decode()] : []));
  const raw = streams.map((bytes) => Buffer.from(bytes).toString('latin1')).join('\n');
  const text = [...raw.matchAll(/<([0-9A-Fa-f]*)> Tj/g)]
    .map((m) => Buffer.from(m[1]!, 'hex').toString('latin1'))
    .join('\n');
  return { title: doc.getTitle(), pages: doc.getPageCount(), text };
}

describe('GET /api/orders/:id/receipt.pdf', () => {
  it('gives the buyer a one-page receipt of what they paid, without the seller’s side of the money', async () => {
    const order = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'sent', itemMinor: 24_000 });
    const pdf = await receipt(buyerAgent, order.id);
    expect(pdf.title).toBe(`Benchwright receipt for order ${order.id}`);
    expect(pdf.pages).toBe(1);
    expect(pdf.text).toContain('Bought by Marsh Lane Modellers from Tollgate Benchwork');
    expect(pdf.text).toMatch(/Total paid\n£240\.00/);
    expect(pdf.text).not.toContain('commission');
  });

  it('gives the seller a copy with the commission and their payout', async () => {
    // 24 000 p at 800 bp: commission 1 920 p, payout 22 080 p (shared/orders/money.ts, our rule).
    const order = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'received', itemMinor: 24_000 });
    const pdf = await receipt(sellerAgent, order.id);
    expect(pdf.text).toContain('Sale receipt');
    expect(pdf.text).toMatch(/Benchwright commission \(8\.00 %\)\n- £19\.20/);
    expect(pdf.text).toMatch(/Payout to the seller\n£220\.80/);
  });

  it('answers 409 before the order is paid and 404 to anyone outside it', async () => {
    const unpaid = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'awaiting_payment' });
    const res = await buyerAgent.get(`/api/orders/${unpaid.id}/receipt.pdf`).expect(409);
    expect(res.body.error.message).toBe('A receipt is available once the order has been paid.');
    const stranger = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const paid = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'sent' });
    await stranger.get(`/api/orders/${paid.id}/receipt.pdf`).expect(404);
  });
});

describe('GET /api/orders', () => {
  it('lists a member’s purchases and sales separately, newest first, with the other side named', async () => {
    const ds = app.ctx.dataSource;
    const me = await buildUser(ds);
    const other = await buildUser(ds, { displayName: 'Fenwick Junction Club' });
    const bought = await buildOrder(ds, me, other, { state: 'sent', itemMinor: 12_000 });
    const bought2 = await buildOrder(ds, me, other, { state: 'paid_held', itemMinor: 8_000 });
    const sold = await buildOrder(ds, other, me, { state: 'received', itemMinor: 10_000 });
    const agent = await signedInAs(app, me);
    const buying = (await agent.get('/api/orders?side=buying').expect(200)).body;
    expect(buying.items.map((o: { id: number }) => o.id)).toEqual([bought2.id, bought.id]);
    expect(buying.items[1]).toMatchObject({
      otherParty: 'Fenwick Junction Club',
      amountMinor: 12_000,
      stateLabel: 'On its way',
    });
    const selling = (await agent.get('/api/orders?side=selling').expect(200)).body;
    // A sale shows what the seller is due: 10 000 p less 8 % commission.
    expect(selling.items).toMatchObject([{ id: sold.id, amountMinor: 9_200, otherParty: 'Fenwick Junction Club' }]);
    await agent.get('/api/orders?side=lending').expect(422);
  });
});
