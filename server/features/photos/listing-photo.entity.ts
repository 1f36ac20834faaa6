import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { Listing } from '../listings/listing.entity';

/**
 * One photo of a listing. Its two re-encoded sizes live in object storage under `listings/<storageKey>/`; the key
 * is 32 random bytes (base64url) so a photo's address cannot be guessed from another's. Compared byte for byte
 * (ascii_bin): keys differing only in case are different keys.
 */
@Entity({ name: 'listing_photos' })
@Index('ix_listing_photos_listing', ['listingId', 'position'])
@Index('uq_listing_photos_key', ['storageKey'], { unique: true })
export class ListingPhoto {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'listing_id', type: 'int', unsigned: true })
  listingId: number;

  @ManyToOne(() => Listing, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'listing_id', foreignKeyConstraintName: 'fk_listing_photos_listing' })
  listing?: Listing;

  /** 1 for the first photo in the seller's order. */
  @Column({ type: 'tinyint', unsigned: true })
  position: number;

  /** Exactly one photo of a listing that has any is its cover. */
  @Column({ name: 'is_cover', type: 'boolean' })
  isCover: boolean;

  @Column({ name: 'storage_key', type: 'char', length: 43, charset: 'ascii', collation: 'ascii_bin' })
  storageKey: string;

  /** Pixel size of the display variant. */
  @Column({ type: 'smallint', unsigned: true })
  width: number;

  @Column({ type: 'smallint', unsigned: true })
  height: number;

  @Column({ name: 'thumb_bytes', type: 'int', unsigned: true })
  thumbBytes: number;

  @Column({ name: 'display_bytes', type: 'int', unsigned: true })
  displayBytes: number;

  @CreatedAtColumn()
  createdAt: Date;
}
