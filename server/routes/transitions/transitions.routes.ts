import { Router } from 'express';
import { transitionInputSchema } from '../../../shared/workflow/transition-inputs';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { changeStatus } from '../../services/transitions/change-status';
import { requestView } from '../requests/request-view';

export function transitionsRouter({ db, env }: AppContext) {
  const router = Router();
  const transitionCtx = { db, officeEmail: env.OFFICE_EMAIL, appOrigin: env.APP_ORIGIN };

  router.post('/api/requests/:id/transitions', handle({ params: uuidParam, body: transitionInputSchema }, async ({ params, body, user }) => {
    const { request } = await changeStatus(transitionCtx, user, params.id, body);
    return { request: requestView(request, user) };
  }));
  return router;
}
