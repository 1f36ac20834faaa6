import { AuditEvent } from '../features/audit/audit-event.entity';
import { OneTimeToken } from '../features/auth/one-time-token.entity';
import { BuilderProfile } from '../features/builders/builder-profile.entity';
import { ListingDecision } from '../features/listings/listing-decision.entity';
import { ListingReport } from '../features/listings/listing-report.entity';
import { Listing } from '../features/listings/listing.entity';
import { OutboundEmail } from '../features/mail/outbound-email.entity';
import { FeeSchedule } from '../features/orders/fee-schedule.entity';
import { HandledPaymentEvent } from '../features/orders/handled-payment-event.entity';
import { MoneyMovement } from '../features/orders/money-movement.entity';
import { OrderEvent } from '../features/orders/order-event.entity';
import { OrderPayment } from '../features/orders/order-payment.entity';
import { Order } from '../features/orders/order.entity';
import { PayoutAccount } from '../features/orders/payout-account.entity';
import { ListingPhoto } from '../features/photos/listing-photo.entity';
import { SavedPlan } from '../features/plans/saved-plan.entity';
import { SavedSearchHit } from '../features/saved-searches/saved-search-hit.entity';
import { SavedSearch } from '../features/saved-searches/saved-search.entity';
import { ShortlistEntry } from '../features/shortlist/shortlist-entry.entity';
import { User } from '../features/users/user.entity';
import { ConversationMessage } from '../features/conversations/conversation-message.entity';
import { ConversationParticipant } from '../features/conversations/conversation-participant.entity';
import { Conversation } from '../features/conversations/conversation.entity';
import { Review } from '../features/reviews/review.entity';
import { BuilderQuoteSettings } from '../features/quotes/builder-quote-settings.entity';
import { QuoteRecipient } from '../features/quotes/quote-recipient.entity';
import { QuoteRequest } from '../features/quotes/quote-request.entity';
import { Quote } from '../features/quotes/quote.entity';

/** Every entity, listed once so the data source and tests agree. */
export const entities = [
  User,
  OneTimeToken,
  AuditEvent,
  OutboundEmail,
  Listing,
  ListingDecision,
  ListingReport,
  ListingPhoto,
  BuilderProfile,
  SavedPlan,
  ShortlistEntry,
  SavedSearch,
  SavedSearchHit,
  Order,
  OrderEvent,
  OrderPayment,
  MoneyMovement,
  PayoutAccount,
  HandledPaymentEvent,
  FeeSchedule,
  Conversation,
  ConversationParticipant,
  ConversationMessage,
  Review,
  QuoteRequest,
  QuoteRecipient,
  Quote,
  BuilderQuoteSettings,
];
