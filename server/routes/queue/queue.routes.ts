import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { assignRequest, queueOptions } from '../../services/queue/assignment.service';
import { queueQuerySchema } from '@shared/contracts/queue';
import { listQueue } from '../../services/queue/queue.service';
import { QueuePages } from '../../services/queue/queue-pages';

export const assignInputSchema = z.strictObject({
  assigneeId: z.uuid('must be a person’s id, or null to unassign').nullable(),
});

/** `keepPages: false` builds every page afresh: the queue bench measures what a page costs after a change. */
export function queueRouter({ db, queueChanges }: AppContext, { keepPages = true } = {}) {
  const router = Router();
  const office = requireRole(...officeRoles);
  const pages = keepPages ? new QueuePages(queueChanges) : null;
  router.get(
    '/api/queue',
    office,
    handle({ query: queueQuerySchema }, async ({ query, user, res }) => {
      if (!pages) return listQueue(db, user, query);
      const assignee = query.assignee === 'me' ? user.id : query.assignee;
      res.type('json').send(await pages.page(query, assignee, () => listQueue(db, user, query)));
    }),
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
