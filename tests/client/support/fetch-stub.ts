import { vi } from 'vitest';

/** One answer the stubbed API gives. */
export interface StubAnswer {
  status?: number;
  body?: unknown;
  headers?: Record<string, string>;
}

/** A JSON response like the API's. */
export function jsonResponse({ status = 200, body, headers = {} }: StubAnswer): Response {
  const text = body === undefined ? '' : JSON.stringify(body);
  return new Response(status === 204 ? null : text, {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

/**
 * Replace `fetch` with a stub that answers by "METHOD /path" (query string ignored) from `routes`.
 * Each route may hold several answers, used in turn (the last one repeats).
 */
export function stubApi(routes: Record<string, StubAnswer | StubAnswer[]>) {
  const used = new Map<string, number>();
  const fetchStub = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost');
    const key = `${init?.method ?? 'GET'} ${url.pathname}`;
    const entry = routes[key];
    if (!entry) return jsonResponse({ status: 404, body: { error: { code: 'not_found', message: 'No stub.' } } });
    const answers = Array.isArray(entry) ? entry : [entry];
    const index = used.get(key) ?? 0;
    used.set(key, index + 1);
    return jsonResponse(answers[Math.min(index, answers.length - 1)]!);
  });
  vi.stubGlobal('fetch', fetchStub);
  return fetchStub;
}

/** The headers that the stub received on its `n`-th call. */
export function headersOfCall(fetchStub: ReturnType<typeof stubApi>, n: number): Record<string, string> {
  const init = fetchStub.mock.calls[n]?.[1];
  return (init?.headers ?? {}) as Record<string, string>;
}
