import { Router } from 'express';
import {
  attachGradeCheckInputSchema,
  saveGradeCheckDraftInputSchema,
  saveGradeCheckInputSchema,
  type GradeCheckDraftAnswer,
  type GradeCheckAttachedView,
  type GradeCheckListView,
  type GradeCheckSavedView,
} from '@shared/contracts/grade-checks';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { attachGradeCheck } from '../../services/documents/attach-grade-check';
import { withdrawGradeCheck } from '../../services/grade-checks/withdraw-grade-check';
import {
  listGradeChecks,
  loadVisibleGradeCheck,
  saveGradeCheck,
} from '../../services/grade-checks/grade-checks.service';
import {
  discardGradeCheckDraft,
  loadGradeCheckDraft,
  saveGradeCheckDraft,
} from '../../services/grade-checks/grade-check-drafts.service';
import { checkView, requestHeader } from '../../services/grade-checks/grade-check-view';

export function gradeChecksRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  const office = requireRole(...officeRoles);

  router.get(
    '/api/requests/:id/grade-checks',
    handle({ params: uuidParam }, async ({ params, user }) => {
      const { request, checks } = await listGradeChecks(db, user, params.id);
      return {
        request: requestHeader(request),
        checks: checks.map((c) => checkView(c, user)),
      } satisfies GradeCheckListView;
    }),
  );
  router.post(
    '/api/requests/:id/grade-checks',
    office,
    handle({ params: uuidParam, body: saveGradeCheckInputSchema }, async ({ params, body, user, res }) => {
      const row = await saveGradeCheck(db, user, params.id, body);
      res.status(201);
      return { check: checkView(row, user) } satisfies GradeCheckSavedView;
    }),
  );
  router.get(
    '/api/requests/:id/grade-check-draft',
    office,
    handle(
      { params: uuidParam },
      async ({ params, user }) =>
        ({
          draft: await loadGradeCheckDraft(db, user, params.id),
        }) satisfies GradeCheckDraftAnswer<Date>,
    ),
  );
  router.put(
    '/api/requests/:id/grade-check-draft',
    office,
    handle(
      { params: uuidParam, body: saveGradeCheckDraftInputSchema },
      async ({ params, body, user }) =>
        ({
          draft: await saveGradeCheckDraft(db, user, params.id, body),
        }) satisfies GradeCheckDraftAnswer<Date>,
    ),
  );
  router.delete(
    '/api/requests/:id/grade-check-draft',
    office,
    handle({ params: uuidParam }, async ({ params, user }) => {
      await discardGradeCheckDraft(db, user, params.id);
      return { draft: null } satisfies GradeCheckDraftAnswer<Date>;
    }),
  );
  router.get(
    '/api/grade-checks/:id',
    handle(
      { params: uuidParam },
      async ({ params, user }) =>
        ({
          check: checkView(await loadVisibleGradeCheck(db, user, params.id), user),
        }) satisfies GradeCheckSavedView,
    ),
  );
  router.post(
    '/api/grade-checks/:id/attach',
    office,
    handle({ params: uuidParam, body: attachGradeCheckInputSchema }, async ({ params, body, user }) => {
      const { document, check } = await attachGradeCheck(
        ctx,
        user,
        params.id,
        body.shareWithApplicant,
        body.confirmFailing,
      );
      return { check: checkView(check, user), documentId: document.id } satisfies GradeCheckAttachedView;
    }),
  );
  router.post(
    '/api/grade-checks/:id/withdraw',
    office,
    handle({ params: uuidParam }, async ({ params, user }) => ({
      check: checkView(await withdrawGradeCheck(db, user, params.id), user),
    })),
  );
  return router;
}
