import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { decodeCursor, emailStatuses, getEmail, listEmails, retryAllDead, retryEmail } from '../../services/email/email-log.service';

export const listEmailsQuerySchema = z.object({
  status: z.enum(emailStatuses, { error: `must be one of: ${emailStatuses.join(', ')}` }).optional(),
  requestId: z.uuid('must be a valid id').optional(),
  search: z.string().trim().max(100, 'must be at most 100 characters').optional(),
  cursor: z.string().max(200).optional()
    .transform((value, ctx) => {
      if (value === undefined || value === '') return undefined;
      const cursor = decodeCursor(value);
      if (!cursor) ctx.addIssue({ code: 'custom', message: 'is not a position this list gave out' });
      return cursor ?? undefined;
    }),
  limit: z.coerce.number('must be a number').int('must be a whole number').min(1).max(200).default(50),
});

export function emailsRouter({ db }: AppContext) {
  const router = Router();
  router.use('/api/emails', requireRole(...officeRoles));
  router.get('/api/emails', handle({ query: listEmailsQuerySchema }, async ({ query }) => listEmails(db, query)));
  router.get('/api/emails/:id', handle({ params: uuidParam }, async ({ params }) => ({ email: await getEmail(db, params.id) })));
  router.post('/api/emails/retry-dead', handle({}, async () => retryAllDead(db)));
  router.post('/api/emails/:id/retry', handle({ params: uuidParam }, async ({ params }) => ({ email: await retryEmail(db, params.id) })));
  return router;
}
