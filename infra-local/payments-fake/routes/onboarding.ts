import { Router, type Request, type Response } from 'express';
import { completeOnboarding } from '../domain/accounts';
import { runMutation } from '../http/api-route';
import type { Runtime } from '../runtime';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function httpUrl(value: unknown): string | null {
  if (typeof value !== 'string') return null;
  try {
    const url = new URL(value);
    return url.protocol === 'http:' || url.protocol === 'https:' ? url.toString() : null;
  } catch {
    return null;
  }
}

function page(res: Response, status: number, title: string, body: string): void {
  res
    .status(status)
    .set({
      'Content-Type': 'text/html; charset=utf-8',
      'Cache-Control': 'no-store',
      'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'",
    })
    .send(
      `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title>` +
        '<style>body{font-family:sans-serif;max-width:36rem;margin:3rem auto;padding:0 1rem}' +
        'button{font-size:1rem;padding:.6rem 1.2rem}</style></head>' +
        `<body><h1>${escapeHtml(title)}</h1>${body}</body></html>`,
    );
}

/**
 * The page an account link points to, standing in for Stripe's hosted onboarding.
 * GET shows a button; submitting it (POST) marks the account onboarded and redirects (303)
 * to the link's return_url. "Leave" goes to refresh_url without changing anything.
 */
export function onboardingRoutes(runtime: Runtime): Router {
  const router = Router();

  const resolve = (
    req: Request,
    res: Response,
  ): { accountId: string; returnUrl: string; refreshUrl: string | null } | null => {
    const accountId = typeof req.params.account === 'string' ? req.params.account : '';
    const returnUrl = httpUrl(req.query.return_url);
    if (!runtime.store.state.accounts[accountId]) {
      page(res, 404, 'Unknown account', `<p>No such account: ${escapeHtml(accountId)}</p>`);
      return null;
    }
    if (!returnUrl) {
      page(res, 400, 'Invalid link', '<p>The link has no valid return_url.</p>');
      return null;
    }
    return { accountId, returnUrl, refreshUrl: httpUrl(req.query.refresh_url) };
  };

  router.get('/_fake/onboarding/:account', (req, res) => {
    const link = resolve(req, res);
    if (!link) return;
    const leave = link.refreshUrl ? `<p><a href="${escapeHtml(link.refreshUrl)}">Leave without finishing</a></p>` : '';
    page(
      res,
      200,
      'Payments fake: connect your payout account',
      `<p>Account <code>${escapeHtml(link.accountId)}</code>. This page stands in for Stripe's hosted onboarding.</p>` +
        `<form method="post"><button type="submit">Complete onboarding</button></form>${leave}`,
    );
  });

  router.post('/_fake/onboarding/:account', (req, res) => {
    const link = resolve(req, res);
    if (!link) return;
    runMutation(runtime, req, (ctx) => {
      const account = ctx.store.state.accounts[link.accountId];
      if (account) completeOnboarding(ctx, account);
    });
    res.redirect(303, link.returnUrl);
  });

  return router;
}
