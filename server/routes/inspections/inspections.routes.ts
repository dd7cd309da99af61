import { Router } from 'express';
import { z } from 'zod';
import {
  inspectionOutcomeInputSchema,
  inspectorTokenHeader,
  sendInspectorLinkInputSchema,
  type InspectionsAnswer,
  type InspectorLinkView,
  type InspectorPageView,
  type SentInspectorLink,
} from '@shared/contracts/inspections';
import { isOfficeRole } from '@shared/workflow/statuses';
import type { AppContext } from '../../config/context';
import { handle, handlePublic, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { loadVisibleRequest } from '../../services/requests/request-access';
import { inspectorPage, listInspections } from '../../services/inspections/inspection-page.service';
import { recordOutcome } from '../../services/inspections/inspection-outcome.service';
import {
  linkView,
  listLinks,
  resolveLink,
  revokeInspectorLink,
  sendInspectorLink,
} from '../../services/inspections/inspector-links.service';
import { jobNeedsInspection } from '../../services/transitions/inspection-state';

const linkParams = z.object({ id: z.uuid('must be a valid id'), linkId: z.uuid('must be a valid id') });
/** A malformed id on the public page answers the same 404 as a wrong token, so the page never confirms an id. */
const anyId = z.object({ id: z.string() });

/**
 * The road authority's inspection: the office sends and withdraws links and reads the outcomes; the inspector,
 * with no account, opens the one request a link is for and records the outcome there.
 */
export function inspectionsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  const office = requireRole(...officeRoles);

  router.get(
    '/api/requests/:id/inspections',
    handle({ params: uuidParam }, async ({ params, user }) => {
      await loadVisibleRequest(db, user, params.id);
      const answer: InspectionsAnswer<Date> = {
        inspections: await listInspections(db, params.id),
        inspectionRequired: await jobNeedsInspection(db, params.id),
      };
      if (isOfficeRole(user.role)) answer.links = (await listLinks(db, params.id)).map((l) => linkView(l));
      return answer;
    }),
  );

  router.post(
    '/api/requests/:id/inspector-links',
    office,
    handle({ params: uuidParam, body: sendInspectorLinkInputSchema }, async ({ params, body, user, res }) => {
      const { link, url } = await sendInspectorLink(ctx, user, params.id, body);
      res.status(201);
      return { link: linkView(link), url } satisfies SentInspectorLink<Date>;
    }),
  );

  router.post(
    '/api/requests/:id/inspector-links/:linkId/revoke',
    office,
    handle({ params: linkParams }, async ({ params, user }) => ({
      link: linkView(await revokeInspectorLink(db, user, params.id, params.linkId)) satisfies InspectorLinkView<Date>,
    })),
  );

  // The inspector's side: the token comes in a header, read by the page from its address's #fragment.
  router.get(
    '/api/inspect/:id',
    handlePublic({ params: anyId }, async ({ params, req, res }) => {
      res.setHeader('Cache-Control', 'no-store');
      const link = await resolveLink(db, params.id, req.get(inspectorTokenHeader));
      return (await inspectorPage(ctx, link)) satisfies InspectorPageView<Date>;
    }),
  );

  router.post(
    '/api/inspect/:id/outcome',
    handlePublic({ params: anyId, body: inspectionOutcomeInputSchema }, async ({ params, body, req, res }) => {
      res.setHeader('Cache-Control', 'no-store');
      const link = await resolveLink(db, params.id, req.get(inspectorTokenHeader));
      await recordOutcome(ctx, link, body);
      const fresh = await resolveLink(db, params.id, req.get(inspectorTokenHeader));
      return (await inspectorPage(ctx, fresh)) satisfies InspectorPageView<Date>;
    }),
  );
  return router;
}
