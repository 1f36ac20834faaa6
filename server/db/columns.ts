import { CreateDateColumn, UpdateDateColumn } from 'typeorm';

/**
 * The `created_at` column every table has: millisecond precision, set by MariaDB. TypeORM's own default is
 * CURRENT_TIMESTAMP(6) whatever the precision, which would differ from the migrations; hence the explicit default.
 */
export const CreatedAtColumn = () =>
  CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' });

/** The `updated_at` column: millisecond precision, refreshed by MariaDB on every update. */
export const UpdatedAtColumn = () =>
  UpdateDateColumn({
    name: 'updated_at',
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  });
