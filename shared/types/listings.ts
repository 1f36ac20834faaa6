import type { LatLon } from '../geo';
import type { BuilderProfileState } from '../listings/builders';
import type { ContactKind } from '../listings/contact-details';
import type { ChecklistItem, Decision, ReportReason, SellerAction } from '../listings/moderation';
import type { ListingState } from '../listings/states';
import type { RatingSummary } from '../reviews/ratings';
import type { BuildKind, Currency, ListingKind } from '../listings/vocabulary';
import type { ScaleGauge } from '../scales';
import type { ChecklistAnswers } from '../schemas/listing-moderation';
import type { ListingSort, ModuleListingInput, ServiceListingInput } from '../schemas/listings';
import type { TownView } from './towns';
import type { Page } from './user';

type CommonInput = 'kind' | 'title' | 'description' | 'townId' | 'position' | 'currency';

/** A module's specification as shown on its page. */
export type ModuleDetailsView = Omit<ModuleListingInput, CommonInput | 'scaleId'> & { scale: ScaleGauge };

/** A build service's offer as shown on its page. */
export type ServiceDetailsView = Omit<ServiceListingInput, CommonInput>;

/**
 * A listing photo: two re-encoded JPEG sizes served by Benchwright (the uploaded file is never kept). `position`
 * counts from 1 in the seller's order; `width` and `height` are the display size's, for layout before it loads.
 */
export interface PhotoView {
  id: number;
  position: number;
  isCover: boolean;
  thumbUrl: string;
  displayUrl: string;
  width: number;
  height: number;
}

/** The answer to an upload: the new photo and all the listing's photos in order. */
export interface PhotoUploadResult {
  photo: PhotoView;
  photos: PhotoView[];
}

/** A listing as anyone who may see it sees it. */
export interface ListingView {
  id: number;
  kind: ListingKind;
  state: ListingState;
  title: string;
  /** Plain text: show it as text, never as HTML. */
  description: string;
  currency: Currency;
  seller: { id: number; displayName: string };
  /** From the seller's shown reviews. */
  sellerRating: RatingSummary;
  town: TownView;
  /** Rounded to about a kilometre: never a street address. */
  position: LatLon;
  module: ModuleDetailsView | null;
  service: ServiceDetailsView | null;
  /** The cover first, then the rest in the seller's order. */
  photos: PhotoView[];
  publishedAt: string | null;
  updatedAt: string;
  /** From the searched town, km, when the search named one. */
  distanceKm?: number;
}

/** A moderator's decision, as the seller sees it (the moderator unnamed) or a moderator sees it. */
export interface DecisionView {
  decision: Decision;
  reasons: string[];
  note: string;
  at: string;
  moderator?: { id: number; displayName: string };
  checklist?: ChecklistAnswers | null;
  sellerAction?: SellerAction | null;
}

/** A listing as its seller and moderators see it: with its dates and the last decision. */
export interface OwnListingView extends ListingView {
  createdAt: string;
  submittedAt: string | null;
  stateChangedAt: string;
  lastDecision: DecisionView | null;
}

/** A search result: the listing, and its cover's thumbnail for the result card (null when it has no photos). */
export interface ListingSearchItem extends ListingView {
  coverThumbUrl: string | null;
}

/** One page of search results, with the order used and the query as understood. */
export interface ListingSearchResult extends Page<ListingSearchItem> {
  sort: ListingSort;
}

export interface ReportView {
  id: number;
  reason: ReportReason;
  details: string;
  reporter: { id: number; displayName: string };
  at: string;
}

/** A spot in the text that looks like an e-mail address or phone number. */
export interface ContactFlagView {
  field: 'title' | 'description' | 'conditionNotes' | 'boardConnectors';
  kind: ContactKind;
  match: string;
}

/** One listing waiting for a moderator: for review, because of reports, or both. */
export interface ModerationQueueItem {
  listing: OwnListingView;
  queuedAt: string;
  awaitingReview: boolean;
  reports: ReportView[];
  checklist: { item: ChecklistItem; label: string }[];
  flags: ContactFlagView[];
  history: DecisionView[];
}

export interface BuilderProfileView {
  id: number;
  user: { id: number; displayName: string };
  businessName: string;
  about: string;
  town: TownView;
  builds: BuildKind[];
  state: BuilderProfileState;
  decisionNote: string | null;
  appliedAt: string;
  decidedAt: string | null;
}
