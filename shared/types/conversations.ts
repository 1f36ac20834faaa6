import type { ContactKind } from '../listings/contact-details';
import type { ListingState } from '../listings/states';
import type { OrderState } from '../orders/states';

/** A thread is about a listing (a member's questions to its seller) or about one order. */
export type ConversationKind = 'listing' | 'order';
/** How the viewer takes part: as the asking member or buyer, as the seller or builder, or as a moderator reading. */
export type ConversationRole = 'buyer' | 'seller' | 'moderator';

export interface ConversationPerson {
  id: number;
  displayName: string;
}

/** A thread as the Messages list and the thread page's heading show it. */
export interface ConversationSummary {
  id: number;
  kind: ConversationKind;
  listing: { id: number; title: string; state: ListingState; coverThumbUrl: string | null };
  order: { id: number; state: OrderState } | null;
  buyer: ConversationPerson;
  seller: ConversationPerson;
  you: ConversationRole;
  /** Messages the viewer has not read yet (always 0 for a moderator). */
  unreadCount: number;
  lastMessage: { senderId: number; preview: string; at: string } | null;
}

/** Contact details found in a message; shown to moderators only. */
export interface ContactDetailFlag {
  kind: ContactKind;
  match: string;
}

export interface MessageView {
  id: number;
  senderId: number;
  /** Plain text with line breaks; shown as text, never as HTML. */
  body: string;
  at: string;
  /** Present only for moderators, and only when the message holds a phone number or an e-mail address. */
  contactDetails?: ContactDetailFlag[];
}

/** One page of a thread, oldest message first. */
export interface MessagePage {
  messages: MessageView[];
  /** Whether older messages exist before the first one here. */
  hasEarlier: boolean;
}

/** A thread with its latest page of messages. */
export interface ThreadView extends MessagePage {
  conversation: ConversationSummary;
  /** The newest message the other participant has read, so the viewer can tell what has been seen. */
  otherReadUpTo: number | null;
}

/** What a moderator sees of a thread in which someone shared contact details: who shared what, and when. */
export interface FlaggedThreadView {
  conversation: Omit<ConversationSummary, 'you' | 'unreadCount' | 'lastMessage'>;
  /** Whether the moderator may open the whole thread (an order with a problem raised). */
  readable: boolean;
  flags: { messageId: number; sender: ConversationPerson; at: string; details: ContactDetailFlag[] }[];
}

/**
 * A thread looked up by what it is about (a listing or an order), so a page can open it before it exists:
 * `thread` is null until the first message, and `about` names the subject and the member on the other side.
 */
export interface SubjectThread {
  thread: ThreadView | null;
  about: {
    title: string;
    listingId: number;
    orderId: number | null;
    coverThumbUrl: string | null;
    /** The member on the other side (for a moderator: the seller). */
    other: ConversationPerson;
    /** How the viewer takes part; a moderator reads only. */
    you: ConversationRole;
  };
}

/** What sending answers: the thread the message landed in (new or not), and the message as its sender sees it. */
export interface SentMessage {
  conversationId: number;
  message: MessageView;
}
