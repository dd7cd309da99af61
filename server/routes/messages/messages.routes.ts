import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { listMessages, postMessage } from './messages.service';

export const postMessageInputSchema = z.strictObject({
  body: z.string({ error: 'Write a message.' }).trim().min(1, 'Write a message.').max(4000, 'Keep a message under 4,000 characters.'),
  visibility: z.enum(['internal', 'shared'], { error: 'Choose internal or shared.' }).optional(),
});

export function messagesRouter({ db, env }: AppContext) {
  const router = Router();
  const mail = { officeEmail: env.OFFICE_EMAIL, appOrigin: env.APP_ORIGIN };
  router.get('/api/requests/:id/messages', handle({ params: uuidParam }, async ({ params, user }) => ({
    messages: await listMessages(db, user, params.id),
  })));
  router.post('/api/requests/:id/messages', handle({ params: uuidParam, body: postMessageInputSchema }, async ({ params, body, user, res }) => {
    res.status(201);
    return { message: await postMessage(db, mail, user, params.id, body) };
  }));
  return router;
}
