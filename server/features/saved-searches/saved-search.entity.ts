import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import type { SavedSearchQuery } from '../../../shared/schemas/saved-searches';
import { User } from '../users/user.entity';

/** A search a member named and kept; they are e-mailed when a newly listed listing matches it. */
@Entity({ name: 'saved_searches' })
@Index('ix_saved_searches_owner', ['ownerId', 'createdAt'])
export class SavedSearch {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'owner_id', type: 'int', unsigned: true })
  ownerId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id', foreignKeyConstraintName: 'fk_saved_searches_owner' })
  owner?: User;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  /** The filters as the search schema accepted them, without page, page size or order. */
  @Column({ type: 'json' })
  query: SavedSearchQuery;

  @CreatedAtColumn()
  createdAt: Date;

  @Column({ name: 'last_notified_at', type: 'datetime', precision: 3, nullable: true })
  lastNotifiedAt: Date | null;
}
