import { Router } from 'express';
import { transitionInputSchema } from '@shared/workflow/transition-inputs';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { changeStatus } from '../../services/transitions/change-status';
import { requestView } from '../../services/requests/request-view';

export function transitionsRouter(ctx: AppContext) {
  const router = Router();

  router.post(
    '/api/requests/:id/transitions',
    handle({ params: uuidParam, body: transitionInputSchema }, async ({ params, body, user }) => {
      const { request } = await changeStatus(ctx, user, params.id, body);
      return { request: requestView(request, user) };
    }),
  );
  return router;
}
