import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { assignRequest, queueOptions } from '../../services/queue/assignment.service';
import { queueQuerySchema } from '@shared/contracts/queue';
import { listQueue } from '../../services/queue/queue.service';

export const assignInputSchema = z.strictObject({
  assigneeId: z.uuid('must be a person’s id, or null to unassign').nullable(),
});

export function queueRouter({ db }: AppContext) {
  const router = Router();
  const office = requireRole(...officeRoles);
  router.get(
    '/api/queue',
    office,
    handle({ query: queueQuerySchema }, async ({ query, user }) => listQueue(db, user, query)),
  );
  router.get(
    '/api/queue/options',
    office,
    handle({}, async () => queueOptions(db)),
  );
  router.put(
    '/api/requests/:id/assignee',
    office,
    handle({ params: uuidParam, body: assignInputSchema }, async ({ params, body, user }) => {
      const row = await assignRequest(db, user, params.id, body.assigneeId);
      return { request: { id: row.id, assigneeId: row.assigneeId, version: row.version } };
    }),
  );
  return router;
}
