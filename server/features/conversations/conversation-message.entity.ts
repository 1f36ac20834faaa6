import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import type { ContactDetailFlag } from '../../../shared/types/conversations';
import { User } from '../users/user.entity';
import { Conversation } from './conversation.entity';

/** One message in a thread: plain text, never edited. */
@Entity({ name: 'conversation_messages' })
@Index('ix_conversation_messages_thread', ['conversationId', 'id'])
@Index('ix_conversation_messages_sender_created', ['senderId', 'createdAt'])
export class ConversationMessage {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'conversation_id', type: 'int', unsigned: true })
  conversationId: number;

  @ManyToOne(() => Conversation, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'conversation_id', foreignKeyConstraintName: 'fk_conversation_messages_conversation' })
  conversation?: Conversation;

  @Column({ name: 'sender_id', type: 'int', unsigned: true })
  senderId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'sender_id', foreignKeyConstraintName: 'fk_conversation_messages_sender' })
  sender?: User;

  /** Plain text with line breaks, at most MESSAGE_MAX_LENGTH characters; the client shows it as text. */
  @Column({ type: 'varchar', length: 2000 })
  body: string;

  /** Phone numbers and e-mail addresses found when it was sent; null when none. Shown to moderators only. */
  @Column({ name: 'contact_details', type: 'json', nullable: true })
  contactDetails: ContactDetailFlag[] | null;

  @CreatedAtColumn()
  createdAt: Date;
}
