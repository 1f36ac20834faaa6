import type {
  ConversationPerson,
  ConversationRole,
  ConversationSummary,
  MessageView,
} from '../../../shared/types/conversations';
import type { ListingActor } from '../listings/listing-actor';
import { canSee } from '../listings/listing.policy';
import type { ListingPhoto } from '../photos/listing-photo.entity';
import { presentGallery } from '../photos/photo.presenter';
import type { User } from '../users/user.entity';
import type { ConversationMessage } from './conversation-message.entity';
import type { LoadedConversation } from './conversation.repository';

/** Characters of the newest message shown in the Messages list. */
const PREVIEW_LENGTH = 140;

const person = (u: User): ConversationPerson => ({ id: u.id, displayName: u.displayName });

function preview(body: string): string {
  const flat = body.replace(/\s+/g, ' ').trim();
  return flat.length > PREVIEW_LENGTH ? `${flat.slice(0, PREVIEW_LENGTH - 1)}…` : flat;
}

/** What identifies a thread: its listing, order and members. No e-mail address of either member is ever sent. */
export function presentConversationHead(
  c: LoadedConversation,
  viewer: ListingActor,
  photos: readonly ListingPhoto[],
): Omit<ConversationSummary, 'you' | 'unreadCount' | 'lastMessage'> {
  // A thumbnail only while the listing is shown to the viewer: the photo route would refuse it otherwise.
  const cover = canSee(viewer, c.listing, c.listing.owner) ? (presentGallery(photos)[0]?.thumbUrl ?? null) : null;
  return {
    id: c.id,
    kind: c.kind,
    listing: { id: c.listing.id, title: c.listing.title, state: c.listing.state, coverThumbUrl: cover },
    order: c.order ? { id: c.order.id, state: c.order.state } : null,
    buyer: person(c.buyer),
    seller: person(c.seller),
  };
}

export function presentSummary(
  c: LoadedConversation,
  viewer: ListingActor,
  you: ConversationRole,
  unreadCount: number,
  last: ConversationMessage | undefined,
  photos: readonly ListingPhoto[],
): ConversationSummary {
  return {
    ...presentConversationHead(c, viewer, photos),
    you,
    unreadCount,
    lastMessage: last
      ? { senderId: last.senderId, preview: preview(last.body), at: last.createdAt.toISOString() }
      : null,
  };
}

/** A message; the contact details found in it are shown to moderators only. */
export function presentMessage(msg: ConversationMessage, forModerator: boolean): MessageView {
  return {
    id: msg.id,
    senderId: msg.senderId,
    body: msg.body,
    at: msg.createdAt.toISOString(),
    ...(forModerator && msg.contactDetails?.length ? { contactDetails: msg.contactDetails } : {}),
  };
}
