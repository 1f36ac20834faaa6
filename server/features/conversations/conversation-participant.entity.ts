import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';
import { Conversation } from './conversation.entity';

/**
 * One side of a thread: how far they have read and how many messages wait for them. The header polls the sum of
 * `unread_count` per member, which the (user, unread) index answers without touching the table.
 */
@Entity({ name: 'conversation_participants' })
@Index('ix_conversation_participants_user_unread', ['userId', 'unreadCount'])
export class ConversationParticipant {
  @PrimaryColumn({ name: 'conversation_id', type: 'int', unsigned: true })
  conversationId: number;

  @ManyToOne(() => Conversation, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'conversation_id', foreignKeyConstraintName: 'fk_conversation_participants_conversation' })
  conversation?: Conversation;

  @PrimaryColumn({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_conversation_participants_user' })
  user?: User;

  /** The newest message this side has seen; null before they have opened the thread. */
  @Column({ name: 'last_read_message_id', type: 'int', unsigned: true, nullable: true })
  lastReadMessageId: number | null;

  /** Messages from the other side after `last_read_message_id`. */
  @Column({ name: 'unread_count', type: 'int', unsigned: true, default: 0 })
  unreadCount: number;

  @CreatedAtColumn()
  createdAt: Date;
}
