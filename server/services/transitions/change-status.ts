import { statusText, type RequestStatus } from '@shared/workflow/statuses';
import { actionLabel, allowedTransitions } from '@shared/workflow/transitions';
import type { TransitionBody, TransitionBodyOf } from '@shared/workflow/transition-inputs';
import type { TransitionAction } from '@shared/workflow/transitions';
import type { SessionUser } from '../../lib/session-user';
import { AppError, conflict } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { applyTransition, type TransitionContext } from './apply-transition';
import type { ActionDef, TransitionVia } from './action-def';
import { actionDefs } from './registry';

/**
 * The one door every status change goes through, whichever endpoint it came in by. The body is already parsed
 * with the action's shared input schema.
 */
export async function changeStatus(
  ctx: TransitionContext,
  actor: SessionUser,
  requestId: string,
  body: TransitionBody,
  via: TransitionVia = {},
) {
  try {
    // Answer "not from here" with the current status for the wrong role too, not only the wrong status: the person
    // sees why the button they expected is not there. The locked re-check happens in applyTransition.
    const current = await loadVisibleRequest(ctx.db, actor, requestId);
    if (!allowedTransitions(current.status, actor.role).some((t) => t.action === body.action)) {
      throw conflict(
        `This request is "${statusText[current.status].label}"; "${actionLabel(body.action)}" is not possible from there for you.`,
      );
    }
    const def = actionDefs[body.action] as ActionDef<TransitionAction>;
    const prepared = await def.prepare?.(ctx, { actor, requestId, body: body as TransitionBodyOf<TransitionAction> });
    try {
      return await applyTransition(ctx, actor, requestId, body, via, prepared);
    } catch (error) {
      if (prepared !== undefined) await def.discard?.(ctx, prepared);
      throw error;
    }
  } catch (error) {
    if (!(error instanceof AppError) || (error.status !== 404 && error.status !== 409)) throw error;
    const explained = await actionDefs[body.action].explainRefusal?.(ctx.db, requestId, actor);
    if (explained) throw explained;
    if (error.status === 404) throw error;
    throw await withCurrentStatus(error, async () => (await loadVisibleRequest(ctx.db, actor, requestId)).status);
  }
}

/** A refused change (stale version, lost race) says where the request stands now, so the reader knows what to reload. */
async function withCurrentStatus(error: AppError, load: () => Promise<RequestStatus>) {
  const status = await load().catch(() => null);
  if (!status) return error;
  if (error.message.includes(`"${statusText[status].label}"`)) return error;
  return conflict(`${error.message} It is now "${statusText[status].label}".`);
}
