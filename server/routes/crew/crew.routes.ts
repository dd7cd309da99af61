import { Router } from 'express';
import {
  acceptJobInputSchema, boardQuerySchema, handBackInputSchema, markBuiltInputSchema, saveAsBuiltInputSchema, scheduleJobInputSchema,
  startWorkInputSchema, yardInputSchema,
} from '../../../shared/crew/crew-inputs';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { asBuiltPage, saveAsBuiltSet } from '../../services/crew/as-built.service';
import { listBoard } from '../../services/crew/board.service';
import { acceptJob, handBackJob, startWork } from '../../services/crew/claim.service';
import { fieldSheet } from '../../services/crew/field-sheet.service';
import { markBuilt } from '../../services/crew/mark-built.service';
import { listMyJobs } from '../../services/crew/my-jobs.service';
import { scheduleJob } from '../../services/crew/schedule.service';
import { loadYard, saveYard } from '../../services/crew/yard.service';
import { requestView } from '../requests/request-view';

/**
 * The crew's side: the board of released jobs, taking and handing back, planning the day, the field sheet and
 * the as-built readings. The office may read the board and the sheets; only crew leads act on jobs.
 */
export function crewRouter({ db, env }: AppContext) {
  const router = Router();
  const ctx = { db, officeEmail: env.OFFICE_EMAIL, appOrigin: env.APP_ORIGIN };
  const crewOnly = requireRole('crew');
  router.use('/api/crew', requireRole('crew', ...officeRoles));

  router.get('/api/crew/board', handle({ query: boardQuerySchema }, async ({ query }) => listBoard(db, query.sort)));
  router.get('/api/crew/yard', handle({}, async () => ({ yard: await loadYard(db) })));
  router.put('/api/crew/yard', requireRole('admin'), handle({ body: yardInputSchema }, async ({ body }) => ({ yard: await saveYard(db, body) })));
  router.get('/api/crew/my-jobs', crewOnly, handle({}, async ({ user }) => ({ jobs: await listMyJobs(db, user) })));

  const job = '/api/crew/jobs/:id';
  router.get(`${job}/field-sheet`, handle({ params: uuidParam }, async ({ params, user }) => fieldSheet(db, user, params.id)));
  router.get(`${job}/as-built`, handle({ params: uuidParam }, async ({ params, user }) => asBuiltPage(db, user, params.id)));

  router.post(`${job}/accept`, crewOnly, handle({ params: uuidParam, body: acceptJobInputSchema }, async ({ params, body, user }) => {
    const { request } = await acceptJob(ctx, user, params.id, body.expectedVersion);
    return { request: requestView(request, user) };
  }));
  router.post(`${job}/hand-back`, crewOnly, handle({ params: uuidParam, body: handBackInputSchema }, async ({ params, body, user }) => {
    const { request } = await handBackJob(ctx, user, params.id, body.expectedVersion, body.note);
    return { request: requestView(request, user) };
  }));
  router.post(`${job}/schedule`, crewOnly, handle({ params: uuidParam, body: scheduleJobInputSchema }, async ({ params, body, user }) => (
    scheduleJob(ctx, user, params.id, body)
  )));
  router.post(`${job}/start`, crewOnly, handle({ params: uuidParam, body: startWorkInputSchema }, async ({ params, body, user }) => {
    const { request } = await startWork(ctx, user, params.id, body.expectedVersion);
    return { request: requestView(request, user) };
  }));
  router.post(`${job}/as-built`, crewOnly, handle({ params: uuidParam, body: saveAsBuiltInputSchema }, async ({ params, body, user, res }) => {
    res.status(201);
    return { set: await saveAsBuiltSet(db, user, params.id, body) };
  }));
  router.post(`${job}/mark-built`, crewOnly, handle({ params: uuidParam, body: markBuiltInputSchema }, async ({ params, body, user }) => {
    const { request } = await markBuilt(ctx, user, params.id, body.expectedVersion, body.note ?? '');
    return { request: requestView(request, user) };
  }));
  return router;
}
