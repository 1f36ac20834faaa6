import type {
  ApproveInput,
  DismissReportsInput,
  ModerationQueueQuery,
  SendBackInput,
  TakeDownInput,
} from '@shared/schemas/listing-moderation';
import type { ModerationQueueItem, OwnListingView } from '@shared/types/listings';
import type { Page } from '@shared/types/user';
import { http } from './http';

type Decided = Promise<{ listing: OwnListingView }>;

/** Listings waiting for a moderator (for review, or reported), oldest first. */
export function moderationQueue(
  query: Partial<ModerationQueueQuery>,
  signal?: AbortSignal,
): Promise<Page<ModerationQueueItem>> {
  return http.get<Page<ModerationQueueItem>>('/api/moderation/queue', { ...query }, signal);
}

/** List it: only with every checklist item ticked. */
export function approveListing(id: number, input: ApproveInput): Decided {
  return http.post(`/api/moderation/listings/${id}/approve`, input);
}

/** Back to the seller with reasons; they are e-mailed them. */
export function sendBackListing(id: number, input: SendBackInput): Decided {
  return http.post(`/api/moderation/listings/${id}/send-back`, input);
}

/** Withdraw a listing that breaks the rules, and warn or suspend its seller. */
export function takeDownListing(id: number, input: TakeDownInput): Decided {
  return http.post(`/api/moderation/listings/${id}/take-down`, input);
}

/** The reports were looked at; the listing stays. */
export function dismissReports(id: number, input: DismissReportsInput): Decided {
  return http.post(`/api/moderation/listings/${id}/dismiss-reports`, input);
}
