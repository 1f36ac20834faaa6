import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { auditQuerySchema, type AuditQuery } from '../../../shared/schemas/admin';
import { listAudit } from './audit.service';

/** The audit trail: moderators and administrators read it; nobody edits it. */
export function auditRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireRole('moderator'), validate(auditQuerySchema, 'query'), async (_req, res) => {
    const { page, pageSize } = input<AuditQuery>(res, 'query');
    res.json(await listAudit(ctx.dataSource.manager, page, pageSize));
  });
  return router;
}
