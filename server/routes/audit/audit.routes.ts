import { Router } from 'express';
import { listAuditQuerySchema, type AuditEntryView } from '@shared/contracts/audit';
import type { AppContext } from '../../config/context';
import { handle } from '../../lib/handle';
import { requireRole } from '../../middleware/require-role';
import { listAdminChanges } from '../../services/audit/audit.service';

export function auditRouter({ db }: AppContext) {
  const router = Router();
  router.use('/api/audit', requireRole('admin'));
  router.get(
    '/api/audit',
    handle({ query: listAuditQuerySchema }, async ({ query }) => ({
      entries: (await listAdminChanges(db, query)) satisfies AuditEntryView<Date>[],
    })),
  );
  return router;
}
