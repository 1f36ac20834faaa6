import type {
  AcceptQuoteInput,
  BuildStageInput,
  CreateQuoteRequestInput,
  QuoteSettingsInput,
  SendQuoteInput,
} from '@shared/schemas/quotes';
import type {
  BuildView,
  BuilderChoice,
  InboxItem,
  InboxRequestView,
  QuoteRequestSummary,
  QuoteRequestView,
  QuoteSettingsView,
} from '@shared/types/quotes';
import { http, request } from './http';

/** Builders whose service area reaches a town, nearest first. */
export function listBuilderChoices(townId: number): Promise<{ items: BuilderChoice[] }> {
  return http.get<{ items: BuilderChoice[] }>('/api/quotes/builders', { town: townId });
}

/** Ask builders to price a saved plan. */
export function createQuoteRequest(body: CreateQuoteRequestInput): Promise<{ id: number }> {
  return http.post<{ id: number }>('/api/quotes/requests', body);
}

/** The signed-in buyer's requests, newest first. */
export function listQuoteRequests(): Promise<{ items: QuoteRequestSummary[] }> {
  return http.get<{ items: QuoteRequestSummary[] }>('/api/quotes/requests');
}

/** One of the buyer's requests with every quote. */
export function getQuoteRequest(id: number): Promise<{ request: QuoteRequestView }> {
  return http.get<{ request: QuoteRequestView }>(`/api/quotes/requests/${id}`);
}

/** Accept a quote: the build order to pay the deposit on. */
export function acceptQuote(id: number, body: AcceptQuoteInput): Promise<{ orderId: number }> {
  return http.post<{ orderId: number }>(`/api/quotes/${id}/accept`, body);
}

/** Requests sent to the signed-in builder. */
export function listInbox(): Promise<{ items: InboxItem[] }> {
  return http.get<{ items: InboxItem[] }>('/api/quotes/inbox');
}

/** One request sent to the builder, with the rate card's pricing of the plan. */
export function getInboxRequest(id: number): Promise<{ request: InboxRequestView }> {
  return http.get<{ request: InboxRequestView }>(`/api/quotes/inbox/${id}`);
}

/** Send the builder's quote for a request. */
export function sendQuote(id: number, body: SendQuoteInput): Promise<{ id: number }> {
  return http.post<{ id: number }>(`/api/quotes/inbox/${id}/quote`, body);
}

export function getQuoteSettings(): Promise<{ settings: QuoteSettingsView }> {
  return http.get<{ settings: QuoteSettingsView }>('/api/quotes/settings');
}

export function saveQuoteSettings(body: QuoteSettingsInput): Promise<{ settings: QuoteSettingsView }> {
  return request<{ settings: QuoteSettingsView }>('PUT', '/api/quotes/settings', { body });
}

/** A build order's progress, for its buyer and builder. */
export function getBuild(orderId: number): Promise<{ build: BuildView }> {
  return http.get<{ build: BuildView }>(`/api/builds/${orderId}`);
}

/** The builder records a stage of the build. */
export function recordBuildStage(orderId: number, body: BuildStageInput) {
  return http.post<{ build: BuildView }>(`/api/builds/${orderId}/stages`, body);
}
