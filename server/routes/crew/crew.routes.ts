import { Router } from 'express';
import {
  acceptJobInputSchema,
  boardQuerySchema,
  handBackInputSchema,
  markBuiltInputSchema,
  saveAsBuiltInputSchema,
  scheduleJobInputSchema,
  startWorkInputSchema,
  yardInputSchema,
} from '@shared/crew/crew-inputs';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { readIdempotencyKey } from '../../lib/idempotency';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { asBuiltPage, saveAsBuiltSet } from '../../services/crew/as-built.service';
import { listBoard } from '../../services/crew/board.service';
import { fieldSheet } from '../../services/crew/field-sheet.service';
import { listMyJobs } from '../../services/crew/my-jobs.service';
import { scheduleJob } from '../../services/crew/schedule.service';
import { loadYard, saveYard } from '../../services/crew/yard.service';
import { changeStatus } from '../../services/transitions/change-status';
import type { TransitionBody } from '@shared/workflow/transition-inputs';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { requestView } from '../../services/requests/request-view';

/**
 * The crew's side: the board of released jobs, taking and handing back, planning the day, the field sheet and
 * the as-built readings. The office may read the board and the sheets; only crew leads act on jobs.
 */
export function crewRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  const crewOnly = requireRole('crew');
  router.use('/api/crew', requireRole('crew', ...officeRoles));

  router.get(
    '/api/crew/board',
    handle({ query: boardQuerySchema }, async ({ query }) => listBoard(db, query.sort)),
  );
  router.get(
    '/api/crew/yard',
    handle({}, async () => ({ yard: await loadYard(db) })),
  );
  router.put(
    '/api/crew/yard',
    requireRole('admin'),
    handle({ body: yardInputSchema }, async ({ body, user }) => ({ yard: await saveYard(db, body, user) })),
  );
  router.get(
    '/api/crew/my-jobs',
    crewOnly,
    handle({}, async ({ user }) => ({ jobs: await listMyJobs(db, user) })),
  );

  const job = '/api/crew/jobs/:id';
  router.get(
    `${job}/field-sheet`,
    handle({ params: uuidParam }, async ({ params, user }) => fieldSheet(db, user, params.id)),
  );
  router.get(
    `${job}/as-built`,
    handle({ params: uuidParam }, async ({ params, user }) => asBuiltPage(db, user, params.id)),
  );

  // The crew's own addresses for their status changes: each names the action, then goes through the one door.
  const move = (user: Parameters<typeof changeStatus>[1], id: string, body: TransitionBody) =>
    changeStatus(ctx, user, id, body).then(({ request }) => ({ request: requestView(request, user) }));
  router.post(
    `${job}/accept`,
    crewOnly,
    handle({ params: uuidParam, body: acceptJobInputSchema }, async ({ params, body, user }) =>
      move(user, params.id, { action: 'accept-job', ...body }),
    ),
  );
  router.post(
    `${job}/hand-back`,
    crewOnly,
    handle({ params: uuidParam, body: handBackInputSchema }, async ({ params, body, user }) =>
      move(user, params.id, { action: 'hand-back', ...body }),
    ),
  );
  router.post(
    `${job}/schedule`,
    crewOnly,
    handle({ params: uuidParam, body: scheduleJobInputSchema }, async ({ params, body, user }) =>
      scheduleJob(ctx, user, params.id, body),
    ),
  );
  router.post(
    `${job}/start`,
    crewOnly,
    handle({ params: uuidParam, body: startWorkInputSchema }, async ({ params, body, user }) =>
      move(user, params.id, { action: 'start-work', ...body }),
    ),
  );
  router.post(
    `${job}/as-built`,
    crewOnly,
    handle({ params: uuidParam, body: saveAsBuiltInputSchema }, async ({ params, body, user, req, res }) => {
      const idem = readIdempotencyKey(req, { requestId: params.id, ...body });
      const { set, replayed } = await saveAsBuiltSet(db, user, params.id, body, idem);
      // A repeat gets the first answer, status included; the header only says it is a repeat.
      res.status(201);
      if (replayed) res.set('Idempotent-Replayed', 'true');
      return { set } satisfies { set: AsBuiltSetView };
    }),
  );
  router.post(
    `${job}/mark-built`,
    crewOnly,
    handle({ params: uuidParam, body: markBuiltInputSchema }, async ({ params, body, user }) =>
      move(user, params.id, { action: 'mark-built', ...body }),
    ),
  );
  return router;
}
