import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { REVIEW_ROLES, type ReviewRole } from '../../../shared/reviews/ratings';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { Order } from '../orders/order.entity';
import { User } from '../users/user.entity';

/**
 * One side's rating of the other after an order is paid out: one per side per order. A moderator may hide an
 * abusive one; hidden reviews leave the public list and the subject's rating (users.rating_count/rating_sum).
 */
@Entity({ name: 'reviews' })
@Index('uq_reviews_order_author', ['orderId', 'authorId'], { unique: true })
@Index('ix_reviews_subject_shown', ['subjectId', 'hiddenAt', 'createdAt'])
@Index('ix_reviews_hidden', ['hiddenAt', 'id'])
export class Review {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'order_id', type: 'int', unsigned: true })
  orderId: number;

  @ManyToOne(() => Order, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_reviews_order' })
  order?: Order;

  @Column({ name: 'author_id', type: 'int', unsigned: true })
  authorId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'fk_reviews_author' })
  author?: User;

  /** The other side of the order: the member this review rates. */
  @Column({ name: 'subject_id', type: 'int', unsigned: true })
  subjectId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'subject_id', foreignKeyConstraintName: 'fk_reviews_subject' })
  subject?: User;

  @Column({ name: 'author_role', type: 'enum', enum: REVIEW_ROLES })
  authorRole: ReviewRole;

  @Column({ type: 'tinyint', unsigned: true })
  stars: number;

  /** Plain text, at most 500 characters. */
  @Column({ type: 'varchar', length: 500 })
  text: string;

  @Column({ name: 'hidden_at', type: 'datetime', precision: 3, nullable: true })
  hiddenAt: Date | null;

  @Column({ name: 'hidden_by', type: 'int', unsigned: true, nullable: true })
  hiddenById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'hidden_by', foreignKeyConstraintName: 'fk_reviews_hidden_by' })
  hiddenBy?: User | null;

  @Column({ name: 'hidden_reason', type: 'varchar', length: 500, nullable: true })
  hiddenReason: string | null;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
