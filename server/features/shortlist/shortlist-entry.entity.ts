import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';

/** A listing a member keeps on their shortlist to come back to. Each listing is on a member's shortlist once. */
@Entity({ name: 'shortlist_entries' })
@Index('uq_shortlist_entries_user_listing', ['userId', 'listingId'], { unique: true })
@Index('ix_shortlist_entries_user_created', ['userId', 'createdAt'])
export class ShortlistEntry {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'fk_shortlist_entries_user' })
  user?: User;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_shortlist_entries_listing' })
  listing?: Listing;

  @CreatedAtColumn()
  createdAt: Date;
}
