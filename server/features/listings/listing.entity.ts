import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type ValueTransformer } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../../db/columns';
import { LISTING_STATES, type ListingState } from '../../../shared/listings/states';
import {
  CONDITIONS,
  CONTROL_SYSTEMS,
  COURIER_SERVICES,
  FINISHES,
  JOIN_METHODS,
  LISTING_KINDS,
  type Condition,
  type ControlSystem,
  type CourierService,
  type Currency,
  type Finish,
  type JoinMethod,
  type ListingKind,
} from '../../../shared/listings/vocabulary';
import type { EndProfile } from '../../../shared/schemas/listings';
import { User } from '../users/user.entity';
import type { ListingDetails } from './listing-details';

/** MariaDB returns DECIMAL as a string; positions are numbers everywhere else. */
const decimalNumber: ValueTransformer = {
  to: (value: number | null) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};

/**
 * A module or build-service listing. Columns hold what search filters on; `details` holds the rest of the
 * specification, and `endProfiles` the joining profile of each end. Photos are rows of `listing_photos`
 * (see ListingPhoto).
 */
@Entity({ name: 'listings' })
@Index('ft_listings_text', ['title', 'description'], { fulltext: true })
@Index('ix_listings_state_published', ['state', 'publishedAt'])
@Index('ix_listings_state_price', ['state', 'priceMinor'])
@Index('ix_listings_state_scale', ['state', 'scaleId'])
/** Covers the distance search: the box and service areas are checked, and sellers joined, from the index alone. */
@Index('ix_listings_state_kind_position', ['state', 'kind', 'latitude', 'longitude', 'serviceAreaKm', 'ownerId'])
@Index('ix_listings_state_submitted', ['state', 'submittedAt'])
@Index('ix_listings_owner_state', ['ownerId', 'state'])
export class Listing {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: LISTING_KINDS })
  kind: ListingKind;

  @Column({ type: 'enum', enum: LISTING_STATES, default: 'draft' })
  state: ListingState;

  @Column({ name: 'owner_id', type: 'int', unsigned: true })
  ownerId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id', foreignKeyConstraintName: 'fk_listings_owner' })
  owner?: User;

  @Column({ type: 'varchar', length: 100 })
  title: string;

  /** Plain text; the client shows it as text. */
  @Column({ type: 'text' })
  description: string;

  @Column({ type: 'char', length: 3, default: 'GBP' })
  currency: Currency;

  @Column({ name: 'town_id', type: 'int', unsigned: true })
  townId: number;

  /** Rounded to two decimal places (about a kilometre). */
  @Column({ type: 'decimal', precision: 5, scale: 2, transformer: decimalNumber })
  latitude: number;

  @Column({ type: 'decimal', precision: 6, scale: 2, transformer: decimalNumber })
  longitude: number;

  // Modules only (NULL on services).
  @Column({ name: 'scale_id', type: 'varchar', length: 16, nullable: true })
  scaleId: string | null;

  @Column({ name: 'length_mm', type: 'smallint', unsigned: true, nullable: true })
  lengthMm: number | null;

  @Column({ name: 'width_mm', type: 'smallint', unsigned: true, nullable: true })
  widthMm: number | null;

  @Column({ name: 'height_mm', type: 'smallint', unsigned: true, nullable: true })
  heightMm: number | null;

  @Column({ name: 'board_count', type: 'tinyint', unsigned: true, nullable: true })
  boardCount: number | null;

  @Column({ name: 'join_method', type: 'enum', enum: JOIN_METHODS, nullable: true })
  joinMethod: JoinMethod | null;

  @Column({ type: 'enum', enum: FINISHES, nullable: true })
  finish: Finish | null;

  @Column({ name: 'item_condition', type: 'enum', enum: CONDITIONS, nullable: true })
  condition: Condition | null;

  /** DC or DCC; NULL when the module carries no wiring. */
  @Column({ type: 'enum', enum: CONTROL_SYSTEMS, nullable: true })
  control: ControlSystem | null;

  @Column({ name: 'price_minor', type: 'int', unsigned: true, nullable: true })
  priceMinor: number | null;

  /** The heaviest board, grams. */
  @Column({ name: 'weight_g', type: 'int', unsigned: true, nullable: true })
  weightG: number | null;

  @Column({ name: 'offers_collection', type: 'boolean', nullable: true })
  offersCollection: boolean | null;

  @Column({ name: 'delivery_km', type: 'smallint', unsigned: true, nullable: true })
  deliveryKm: number | null;

  @Column({ name: 'delivery_price_minor', type: 'int', unsigned: true, nullable: true })
  deliveryPriceMinor: number | null;

  @Column({ type: 'enum', enum: COURIER_SERVICES, nullable: true })
  courier: CourierService | null;

  @Column({ name: 'end_profiles', type: 'json', nullable: true })
  endProfiles: { a: EndProfile; b: EndProfile } | null;

  // Services only (NULL on modules).
  @Column({ name: 'service_area_km', type: 'smallint', unsigned: true, nullable: true })
  serviceAreaKm: number | null;

  @Column({ name: 'lead_time_weeks', type: 'tinyint', unsigned: true, nullable: true })
  leadTimeWeeks: number | null;

  /** The kind's remaining specification: see ListingDetails. */
  @Column({ type: 'json' })
  details: ListingDetails;

  @Column({ name: 'submitted_at', type: 'datetime', precision: 3, nullable: true })
  submittedAt: Date | null;

  /** First approval; later re-approvals keep it, so editing does not lift a listing to the top of "newest". */
  @Column({ name: 'published_at', type: 'datetime', precision: 3, nullable: true })
  publishedAt: Date | null;

  @Column({ name: 'state_changed_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  stateChangedAt: Date;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
