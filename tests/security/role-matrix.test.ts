import type { Router } from 'express';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

/**
 * Who may call each API route (OWASP ASVS 5.0 V8.2.1: function-level access control on every
 * route). The routes are read from the app's own routers, so a route added without a line here
 * fails the first test.
 */
type Access = 'anyone' | 'member' | 'moderator' | 'admin';
const EXPECTED: Record<string, Access> = {
  'GET /api/health': 'anyone',
  'GET /api/auth/session': 'anyone',
  'POST /api/auth/sign-up': 'anyone',
  'POST /api/auth/verify-email': 'anyone',
  'POST /api/auth/resend-verification': 'anyone',
  'POST /api/auth/sign-in': 'anyone',
  'POST /api/auth/sign-out': 'anyone',
  'POST /api/auth/password-reset/request': 'anyone',
  'POST /api/auth/password-reset/confirm': 'anyone',
  'POST /api/account/email/confirm': 'anyone',
  'GET /api/account': 'member',
  'PATCH /api/account/profile': 'member',
  'POST /api/account/password': 'member',
  'POST /api/account/email': 'member',
  'GET /api/admin/users': 'admin',
  'PATCH /api/admin/users/:id/role': 'admin',
  'POST /api/admin/users/:id/suspension': 'admin',
  'DELETE /api/admin/users/:id/suspension': 'admin',
  'GET /api/audit-events': 'moderator',
  'POST /api/planner/plan': 'anyone',
  'GET /api/plans': 'member',
  'POST /api/plans': 'member',
  'GET /api/plans/:id': 'member',
  'PUT /api/plans/:id': 'member',
  'DELETE /api/plans/:id': 'member',
  'POST /api/plans/:id/share': 'member',
  'GET /api/shared-plans/:token': 'anyone',
  'GET /api/listings': 'anyone',
  'POST /api/listings': 'member',
  'GET /api/listings/mine': 'member',
  'GET /api/listings/:id': 'anyone',
  'PUT /api/listings/:id': 'member',
  'POST /api/listings/:id/submit': 'member',
  'POST /api/listings/:id/withdraw': 'member',
  'POST /api/listings/:id/reports': 'member',
  'GET /api/listings/:id/photos': 'anyone',
  'POST /api/listings/:id/photos': 'member',
  'PUT /api/listings/:id/photos/order': 'member',
  'POST /api/listings/:id/photos/:photoId/cover': 'member',
  'DELETE /api/listings/:id/photos/:photoId': 'member',
  'GET /api/photos/:key/thumb.jpg': 'anyone',
  'GET /api/photos/:key/display.jpg': 'anyone',
  'GET /api/moderation/queue': 'moderator',
  'POST /api/moderation/listings/:id/approve': 'moderator',
  'POST /api/moderation/listings/:id/send-back': 'moderator',
  'POST /api/moderation/listings/:id/take-down': 'moderator',
  'POST /api/moderation/listings/:id/dismiss-reports': 'moderator',
  'GET /api/shortlist': 'member',
  'PUT /api/shortlist/:listingId': 'member',
  'DELETE /api/shortlist/:listingId': 'member',
  'GET /api/saved-searches': 'member',
  'POST /api/saved-searches': 'member',
  'DELETE /api/saved-searches/:id': 'member',
  'POST /api/builder-profiles': 'member',
  'GET /api/builder-profiles/mine': 'member',
  'GET /api/builder-profiles': 'moderator',
  'POST /api/builder-profiles/:id/approve': 'moderator',
  'POST /api/builder-profiles/:id/decline': 'moderator',
  'GET /api/towns': 'anyone',
  'POST /api/payments/webhook': 'anyone',
  'GET /api/orders/checkout': 'member',
  'POST /api/orders': 'member',
  'GET /api/orders/:id': 'member',
  'POST /api/orders/:id/payments': 'member',
  'POST /api/orders/:id/payments/authenticate': 'member',
  'POST /api/orders/:id/give-up': 'member',
  'GET /api/conversations': 'member',
  'GET /api/conversations/unread-count': 'member',
  'GET /api/conversations/flagged': 'moderator',
  'GET /api/conversations/listings/:id': 'member',
  'POST /api/conversations/listings/:id/messages': 'member',
  'GET /api/conversations/orders/:id': 'member',
  'POST /api/conversations/orders/:id/messages': 'member',
  'GET /api/conversations/:id': 'member',
  'GET /api/conversations/:id/messages': 'member',
  'POST /api/conversations/:id/messages': 'member',
  'POST /api/conversations/:id/read': 'member',
  'GET /api/quotes/builders': 'member',
  'POST /api/quotes/requests': 'member',
  'GET /api/quotes/requests': 'member',
  'GET /api/quotes/requests/:id': 'member',
  'GET /api/quotes/inbox': 'member',
  'GET /api/quotes/inbox/:id': 'member',
  'POST /api/quotes/inbox/:id/quote': 'member',
  'POST /api/quotes/:id/accept': 'member',
  'GET /api/quotes/settings': 'member',
  'PUT /api/quotes/settings': 'member',
  'GET /api/builds/:id': 'member',
  'POST /api/builds/:id/stages': 'member',
  'GET /api/orders/:id/reviews': 'member',
  'POST /api/orders/:id/review': 'member',
  'GET /api/members/:id': 'anyone',
  'GET /api/members/:id/reviews': 'anyone',
  'GET /api/moderation/reviews': 'moderator',
  'POST /api/moderation/reviews/:id/hide': 'moderator',
  'POST /api/moderation/reviews/:id/unhide': 'moderator',
  'GET /api/orders': 'member',
  'GET /api/orders/:id/receipt.pdf': 'member',
  'POST /api/orders/:id/send': 'member',
  'POST /api/orders/:id/offer-collection': 'member',
  'POST /api/orders/:id/confirm-receipt': 'member',
  'POST /api/orders/:id/cancel': 'member',
  'POST /api/orders/:id/problem': 'member',
  'GET /api/order-problems': 'moderator',
  'POST /api/order-problems/:id/settle': 'moderator',
  'POST /api/payouts/account': 'member',
  'GET /api/payouts/account': 'member',
  'GET /api/payouts/balances': 'member',
  'GET /api/fees': 'anyone',
  'GET /api/admin/fees': 'admin',
  'PUT /api/admin/fees': 'admin',
};

type Persona = 'visitor' | 'member' | 'builder' | 'moderator' | 'admin' | 'suspended';
const RANK: Record<Exclude<Persona, 'suspended'>, number> = {
  visitor: 0,
  member: 1,
  builder: 1,
  moderator: 2,
  admin: 3,
};
const NEEDED: Record<Access, number> = { anyone: 0, member: 1, moderator: 2, admin: 3 };

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

function routesOf(instance: AppInstance): string[] {
  return instance.apiMounts.flatMap(([mount, router]: [string, Router]) =>
    (router.stack as RouteLayer[])
      .filter((layer) => layer.route)
      .flatMap((layer) =>
        Object.keys(layer.route!.methods).map(
          (m) => `${m.toUpperCase()} /api${mount}${layer.route!.path === '/' ? '' : layer.route!.path}`,
        ),
      ),
  );
}

let app: AppInstance;
const agents = new Map<Persona, TestAgent>();

beforeAll(async () => {
  app = await startTestApp();
  for (const persona of ['member', 'builder', 'moderator', 'admin', 'suspended'] as const) {
    const role = persona === 'suspended' ? 'member' : persona;
    const user = await buildUser(app.ctx.dataSource, { role });
    const agent = await browserLikeAgent(app);
    useToken(
      agent,
      (await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200)).body,
    );
    if (persona === 'suspended')
      await app.ctx.dataSource.query('UPDATE users SET suspended_at = NOW(3), suspended_reason = ? WHERE id = ?', [
        'matrix check',
        user.id,
      ]);
    agents.set(persona, agent);
  }
  agents.set('visitor', await browserLikeAgent(app));
});
afterAll(() => app.close());

describe('role × route matrix', () => {
  it('lists every API route the app serves, and nothing more', () => {
    expect(routesOf(app).sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  const personas: Persona[] = ['visitor', 'member', 'builder', 'moderator', 'admin', 'suspended'];
  // Sign-out last, so it does not end the personas' sessions before the other routes are tried.
  const ordered = Object.entries(EXPECTED).sort(
    ([a], [b]) => Number(a.endsWith('sign-out')) - Number(b.endsWith('sign-out')),
  );

  for (const persona of personas) {
    it(`lets ${/^[aeiou]/.test(persona) ? 'an' : 'a'} ${persona} through exactly the routes their role allows`, async () => {
      const agent = agents.get(persona)!;
      const rank = persona === 'suspended' ? 0 : RANK[persona];
      const outcomes: Record<string, number> = {};
      for (const [route, access] of ordered) {
        const [method, path] = route.split(' ') as [string, string];
        const url = path.replace(':id', '999999999');
        const res = await (agent as unknown as Record<string, (u: string) => request.Test>)[method.toLowerCase()]!(
          url,
        ).send({});
        const allowed = rank >= NEEDED[access];
        outcomes[route] = res.status;
        if (allowed) expect([401, 403], `${persona} ${route}`).not.toContain(res.status);
        else expect(res.status, `${persona} ${route}`).toBe(rank === 0 ? 401 : 403);
        expect(res.status, `${persona} ${route}`).toBeLessThan(500);
      }
      expect(Object.keys(outcomes)).toHaveLength(Object.keys(EXPECTED).length);
    }, 60_000); // one request per route, well over a hundred in a row
  }
});
