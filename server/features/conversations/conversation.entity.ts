import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import type { ConversationKind } from '../../../shared/types/conversations';
import { Listing } from '../listings/listing.entity';
import { Order } from '../orders/order.entity';
import { User } from '../users/user.entity';

export const CONVERSATION_KINDS = ['listing', 'order'] as const satisfies readonly ConversationKind[];

/**
 * A thread between a buyer and a seller (or builder): one per listing and asking member, and one per order. Each
 * side's read marker and unread count live in ConversationParticipant; the messages in ConversationMessage.
 */
@Entity({ name: 'conversations' })
@Index('uq_conversations_key', ['threadKey'], { unique: true })
@Index('ix_conversations_buyer_created', ['buyerId', 'createdAt'])
@Index('ix_conversations_flagged', ['flaggedAt'])
export class Conversation {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: CONVERSATION_KINDS })
  kind: ConversationKind;

  /**
   * `listing:<listing>:<buyer>` or `order:<order>`. Unique, so asking again finds the same thread and two first
   * messages sent at once cannot open two threads.
   */
  @Column({ name: 'thread_key', type: 'varchar', length: 40 })
  threadKey: string;

  /** The listing asked about, or the order's listing. */
  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_conversations_listing' })
  listing?: Listing;

  @Column({ name: 'order_id', type: 'int', unsigned: true, nullable: true })
  orderId: number | null;

  @ManyToOne(() => Order, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_conversations_order' })
  order?: Order | null;

  /** The member asking, or the order's buyer. */
  @Column({ name: 'buyer_id', type: 'int', unsigned: true })
  buyerId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'buyer_id', foreignKeyConstraintName: 'fk_conversations_buyer' })
  buyer?: User;

  /** The listing's seller, or the order's seller or builder. */
  @Column({ name: 'seller_id', type: 'int', unsigned: true })
  sellerId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'seller_id', foreignKeyConstraintName: 'fk_conversations_seller' })
  seller?: User;

  @Column({ name: 'last_message_at', type: 'datetime', precision: 3, nullable: true })
  lastMessageAt: Date | null;

  /** When someone last shared a phone number or an e-mail address here; moderators list these threads. */
  @Column({ name: 'flagged_at', type: 'datetime', precision: 3, nullable: true })
  flaggedAt: Date | null;

  @CreatedAtColumn()
  createdAt: Date;
}
