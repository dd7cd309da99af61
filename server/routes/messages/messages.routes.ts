import { Router } from 'express';
import { postMessageInputSchema, type MessagesAnswer, type PostMessageAnswer } from '@shared/contracts/messages';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { listMessages, postMessage } from '../../services/messages/messages.service';

export function messagesRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  router.get(
    '/api/requests/:id/messages',
    handle(
      { params: uuidParam },
      async ({ params, user }) =>
        ({
          messages: await listMessages(db, user, params.id),
        }) satisfies MessagesAnswer<Date>,
    ),
  );
  router.post(
    '/api/requests/:id/messages',
    handle({ params: uuidParam, body: postMessageInputSchema }, async ({ params, body, user, res }) => {
      res.status(201);
      return { message: await postMessage(ctx, user, params.id, body) } satisfies PostMessageAnswer<Date>;
    }),
  );
  return router;
}
