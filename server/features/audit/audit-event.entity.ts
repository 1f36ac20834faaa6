import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAtColumn } from '../../db/columns';
import { User } from '../users/user.entity';

/** One recorded decision or security event: who did what to which record, when and from where. */
@Entity({ name: 'audit_events' })
@Index('ix_audit_events_target', ['targetType', 'targetId'])
export class AuditEvent {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ name: 'actor_id', type: 'int', unsigned: true, nullable: true })
  actorId: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'actor_id', foreignKeyConstraintName: 'fk_audit_events_actor' })
  actor?: User | null;

  @Column({ type: 'varchar', length: 64 })
  action: string;

  @Column({ name: 'target_type', type: 'varchar', length: 32, nullable: true })
  targetType: string | null;

  @Column({ name: 'target_id', type: 'varchar', length: 64, nullable: true })
  targetId: string | null;

  @Column({ type: 'json', nullable: true })
  detail: Record<string, unknown> | null;

  @Column({ type: 'varchar', length: 45, nullable: true })
  ip: string | null;

  @Index('ix_audit_events_created_at')
  @CreatedAtColumn()
  createdAt: Date;
}
