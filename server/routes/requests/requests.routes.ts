import { Router } from 'express';
import { saveDraftInputSchema, sitePositionInputSchema, type MyRequestRow } from '@shared/contracts/requests';
import { isOfficeRole } from '@shared/workflow/statuses';
import type { EventsAnswer } from '@shared/contracts/events';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { crewFacts, setSitePosition } from '../../services/requests/site-position.service';
import { loadVisibleRequest } from '../../services/requests/request-access';
import { createDraft, deleteDraft, listMine, saveDraft } from '../../services/requests/drafts.service';
import { expectedOfApplicant, requestView } from '../../services/requests/request-view';
import { listDocumentViews } from '../../services/documents/documents.service';
import { listEvents } from '../../services/requests/timeline.service';

export function requestsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();

  router.post(
    '/api/requests',
    requireRole('applicant'),
    handle({}, async ({ user, res }) => {
      res.status(201);
      return { request: requestView(await createDraft(db, user), user) };
    }),
  );

  router.get(
    '/api/requests/mine',
    requireRole('applicant'),
    handle({}, async ({ user }) => ({
      requests: (await listMine(db, user)).map(
        (row) =>
          ({
            id: row.id,
            reference: row.reference,
            status: row.status,
            siteAddress: row.siteAddress,
            roadName: row.roadName,
            statusChangedAt: row.statusChangedAt,
            updatedAt: row.updatedAt,
            expected: expectedOfApplicant(row.status),
          }) satisfies MyRequestRow<Date>,
      ),
    })),
  );

  router.patch(
    '/api/requests/:id/draft',
    requireRole('applicant'),
    handle({ params: uuidParam, body: saveDraftInputSchema }, async ({ params, body, user }) => ({
      request: requestView(await saveDraft(db, user, params.id, body), user),
    })),
  );

  router.delete(
    '/api/requests/:id',
    requireRole('applicant'),
    handle({ params: uuidParam }, async ({ params, user }) => {
      await deleteDraft(ctx, user, params.id);
      return { deleted: true };
    }),
  );

  router.get(
    '/api/requests/:id',
    handle({ params: uuidParam }, async ({ params, user }) => {
      const row = await loadVisibleRequest(db, user, params.id);
      const { workDay, crewLeadName } = await crewFacts(db, row.id);
      const view = requestView(row, user);
      return {
        request: isOfficeRole(user.role) ? { ...view, workDay, crewLeadName } : { ...view, workDay },
        documents: await listDocumentViews(db, user, params.id),
      };
    }),
  );

  router.put(
    '/api/requests/:id/site-position',
    requireRole(...officeRoles),
    handle({ params: uuidParam, body: sitePositionInputSchema }, async ({ params, body, user }) => {
      const row = await setSitePosition(db, user, params.id, body);
      return { request: { ...requestView(row, user), ...(await crewFacts(db, row.id)) } };
    }),
  );

  router.get(
    '/api/requests/:id/events',
    handle({ params: uuidParam }, async ({ params, user }) => {
      await loadVisibleRequest(db, user, params.id);
      return { events: await listEvents(db, user, params.id) } satisfies EventsAnswer<Date>;
    }),
  );

  return router;
}
