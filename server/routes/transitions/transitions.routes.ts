import { Router } from 'express';
import { statusText } from '../../../shared/workflow/statuses';
import { allowedTransitions } from '../../../shared/workflow/transitions';
import type { AppContext } from '../../context';
import { AppError, conflict } from '../../lib/errors';
import { handle, uuidParam } from '../../lib/handle';
import { acceptJob } from '../../services/crew/claim.service';
import { loadVisibleRequest } from '../../services/requests/request-access';
import { requestView } from '../requests/request-view';
import { actionPatch, runTransitionEffects, type EffectInput } from '../../services/requests/transition-effects';
import { applyTransition, type TransitionInput } from '../../services/requests/transition.service';
import { readNeeds, transitionInputSchema } from './transition-input';

export function transitionsRouter({ db, env }: AppContext) {
  const router = Router();
  const transitionCtx = { db, officeEmail: env.OFFICE_EMAIL, appOrigin: env.APP_ORIGIN };

  router.post('/api/requests/:id/transitions', handle({ params: uuidParam, body: transitionInputSchema }, async ({ params, body, user }) => {
    // Taking a job has one implementation, so every way in tells the crew lead who won a lost race (409).
    if (body.action === 'accept-job' && user.role === 'crew') {
      return { request: requestView((await acceptJob(transitionCtx, user, params.id, body.expectedVersion)).request, user) };
    }
    const { note, patch } = readNeeds(body);
    // Answer "not from here" with the current status for the wrong role too, not only the wrong status:
    // the person sees why the button they expected is not there. The locked re-check happens in applyTransition.
    const current = await loadVisibleRequest(db, user, params.id);
    if (!allowedTransitions(current.status, user.role).some((t) => t.action === body.action)) {
      throw conflict(`This request is "${statusText[current.status].label}" (${current.status}); "${body.action}" is not possible from there for you.`);
    }
    const fullPatch = { ...patch, ...actionPatch(body.action, user) };
    const effects: EffectInput = { action: body.action, actor: user, answer: body.answer, patch: fullPatch };
    const input: TransitionInput = {
      requestId: params.id,
      action: body.action,
      expectedVersion: body.expectedVersion,
      note,
      patch: fullPatch,
      within: async (tx, row) => {
        await runTransitionEffects(tx, row, effects);
        input.emailDetail = effects.emailDetail;
      },
    };
    try {
      const { request } = await applyTransition(transitionCtx, user, input);
      return { request: requestView(request, user) };
    } catch (error) {
      throw await withCurrentStatus(error, () => loadVisibleRequest(db, user, params.id));
    }
  }));
  return router;
}

/** A refused change (stale version, lost race) says where the request stands now, so the reader knows what to reload. */
async function withCurrentStatus(error: unknown, load: () => Promise<{ status: keyof typeof statusText }>) {
  if (!(error instanceof AppError) || error.status !== 409) return error;
  const { status } = await load();
  if (error.message.includes(`(${status})`)) return error;
  return conflict(`${error.message} It is now "${statusText[status].label}" (${status}).`);
}
