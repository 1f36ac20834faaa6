import type { EntityManager } from 'typeorm';
import type { AuditEventView, Page } from '../../../shared/types/user';
import { AuditEvent } from './audit-event.entity';

export interface AuditEntry {
  actorId: number | null;
  action: string;
  targetType?: string;
  targetId?: string | number;
  detail?: Record<string, unknown>;
  ip?: string | null;
}

/** Record a decision or security event in the caller's transaction. */
export async function recordAudit(manager: EntityManager, entry: AuditEntry): Promise<void> {
  await manager.save(
    manager.create(AuditEvent, {
      actorId: entry.actorId,
      action: entry.action,
      targetType: entry.targetType ?? null,
      targetId: entry.targetId === undefined ? null : String(entry.targetId),
      detail: entry.detail ?? null,
      ip: entry.ip ?? null,
    }),
  );
}

/** Newest first, with the actor's display name. */
export async function listAudit(manager: EntityManager, page: number, pageSize: number): Promise<Page<AuditEventView>> {
  const [rows, total] = await manager.getRepository(AuditEvent).findAndCount({
    relations: { actor: true },
    order: { id: 'DESC' },
    skip: (page - 1) * pageSize,
    take: pageSize,
  });
  return {
    items: rows.map((row) => ({
      id: Number(row.id),
      at: row.createdAt.toISOString(),
      actor: row.actor ? { id: row.actor.id, displayName: row.actor.displayName } : null,
      action: row.action,
      targetType: row.targetType,
      targetId: row.targetId,
      detail: row.detail,
      ip: row.ip,
    })),
    total,
    page,
    pageSize,
  };
}
