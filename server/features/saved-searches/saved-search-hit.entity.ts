import { Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { Listing } from '../listings/listing.entity';
import { SavedSearch } from './saved-search.entity';

/** A listing a saved search has already told its member about; the key stops a second e-mail for the pair. */
@Entity({ name: 'saved_search_hits' })
export class SavedSearchHit {
  @PrimaryColumn({ name: 'saved_search_id', type: 'int', unsigned: true })
  savedSearchId: number;

  @ManyToOne(() => SavedSearch, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'saved_search_id', foreignKeyConstraintName: 'fk_saved_search_hits_search' })
  savedSearch?: SavedSearch;

  @PrimaryColumn({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_saved_search_hits_listing' })
  listing?: Listing;

  @CreatedAtColumn()
  createdAt: Date;
}
