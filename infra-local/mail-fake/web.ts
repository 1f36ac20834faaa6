// HTTP side of the mail fake: the inbox page and its JSON API.
import http from 'node:http';
import { renderInbox, renderMessage, renderNotFound } from './inbox-page';
import type { MailStore } from './store';

// Inherited by the srcdoc iframe too: the message's HTML loads nothing from outside.
const PAGE_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data:; frame-src 'self'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

function send(
  res: http.ServerResponse,
  status: number,
  type: string,
  body: string,
  extra: http.OutgoingHttpHeaders = {},
) {
  res.writeHead(status, {
    'content-type': `${type}; charset=utf-8`,
    'cache-control': 'no-store',
    'x-content-type-options': 'nosniff',
    ...extra,
  });
  res.end(body);
}

const sendJson = (res: http.ServerResponse, status: number, value: unknown) =>
  send(res, status, 'application/json', JSON.stringify(value));

const sendHtml = (res: http.ServerResponse, status: number, html: string) =>
  send(res, status, 'text/html', html, { 'content-security-policy': PAGE_CSP });

function safeDecode(value: string): string | undefined {
  try {
    return decodeURIComponent(value);
  } catch {
    return undefined; // malformed escape: treated as an unknown route
  }
}

export function createWebServer(store: MailStore, smtpPort: number): http.Server {
  return http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const method = req.method ?? 'GET';
    const route = url.pathname.replace(/\/+$/, '') || '/';
    const messageId = /^\/(?:api\/)?messages\/([^/]+)$/.exec(route)?.[1];
    const id = messageId === undefined ? undefined : safeDecode(messageId);

    if (route === '/api/messages' && method === 'GET') {
      return sendJson(res, 200, store.list(url.searchParams.get('to') ?? undefined));
    }
    if (route === '/api/messages' && method === 'DELETE') {
      store.clear();
      return sendJson(res, 200, { cleared: true });
    }
    if (route.startsWith('/api/messages/') && id !== undefined && method === 'GET') {
      const message = store.get(id);
      return message ? sendJson(res, 200, message) : sendJson(res, 404, { error: 'message not found', id });
    }
    if (route === '/' && method === 'GET') return sendHtml(res, 200, renderInbox(store.list(), smtpPort));
    if (route.startsWith('/messages/') && id !== undefined && method === 'GET') {
      const message = store.get(id);
      return message ? sendHtml(res, 200, renderMessage(message)) : sendHtml(res, 404, renderNotFound());
    }
    return sendJson(res, 404, { error: 'not found' });
  });
}
