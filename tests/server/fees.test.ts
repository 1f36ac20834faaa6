import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import { FeeSchedule } from '../../server/features/orders/fee-schedule.entity';
import { DEFAULT_BUYER_FEE_BPS, DEFAULT_COMMISSION_BPS } from '../../shared/orders/timing';
import { buildUser } from '../support/factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
}, 60_000);
afterAll(() => app.close());

// Other test files (and other runs) make orders at the default rates, so these tests set the rates to the same
// values: a new schedule row is still written, audited and shown, without changing what anyone else is charged.
const SAME_RATES = { commissionBps: DEFAULT_COMMISSION_BPS, buyerFeeBps: DEFAULT_BUYER_FEE_BPS };

describe('fee settings', () => {
  it('shows anyone the rates that apply now', async () => {
    const res = await request(app.app).get('/api/fees').expect(200);
    expect(res.body.fees).toMatchObject(SAME_RATES);
    expect(Date.parse(res.body.fees.since)).not.toBeNaN();
  });

  it('lets an administrator set new rates: a new schedule row, audited, and shown with who set it', async () => {
    const admin = await buildUser(app.ctx.dataSource, { role: 'admin', displayName: 'Signal Box Admin' });
    const agent = await signedInAs(app, admin);
    const before = await app.ctx.dataSource.getRepository(FeeSchedule).count();
    const res = await agent.put('/api/admin/fees').send(SAME_RATES).expect(200);
    expect(res.body.current).toMatchObject(SAME_RATES);
    expect(res.body.history[0]).toMatchObject({ ...SAME_RATES, setBy: 'Signal Box Admin' });
    expect(await app.ctx.dataSource.getRepository(FeeSchedule).count()).toBe(before + 1);
    const audit = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findOneByOrFail({ actorId: admin.id, action: 'fees.set' });
    expect(audit.detail).toEqual({ from: SAME_RATES, to: SAME_RATES });
    expect((await agent.get('/api/admin/fees').expect(200)).body.history[0].setBy).toBe('Signal Box Admin');
  });

  it('refuses rates outside 0–3000 basis points or not whole, naming the field', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource, { role: 'admin' }));
    const high = await agent.put('/api/admin/fees').send({ commissionBps: 3001, buyerFeeBps: 0 }).expect(422);
    expect(high.body.error.fields.commissionBps).toBe('The commission must be at most 3000 basis points (30 %).');
    const part = await agent.put('/api/admin/fees').send({ commissionBps: 800, buyerFeeBps: 12.5 }).expect(422);
    expect(part.body.error.fields.buyerFeeBps).toMatch(/whole number of basis points/);
    const negative = await agent.put('/api/admin/fees').send({ commissionBps: -1, buyerFeeBps: 0 }).expect(422);
    expect(negative.body.error.fields.commissionBps).toBe('The commission cannot be negative.');
  });

  it('answers 403 to members and moderators, and 401 to visitors', async () => {
    for (const role of ['member', 'moderator'] as const) {
      const agent = await signedInAs(app, await buildUser(app.ctx.dataSource, { role }));
      await agent.get('/api/admin/fees').expect(403);
      await agent.put('/api/admin/fees').send(SAME_RATES).expect(403);
    }
    await request(app.app).get('/api/admin/fees').expect(401);
  });
});
