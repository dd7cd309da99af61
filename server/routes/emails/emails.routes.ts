import { Router } from 'express';
import { listEmailsQuerySchema, type EmailDetailView, type EmailLogPage } from '@shared/contracts/emails';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { decodeCursor, getEmail, listEmails, retryAllDead, retryEmail } from '../../services/email/email-log.service';

/** The shared query, with the cursor read back into the position it stands for. */
const listEmailsQuery = listEmailsQuerySchema.extend({
  cursor: listEmailsQuerySchema.shape.cursor.transform((value, ctx) => {
    if (value === undefined || value === '') return undefined;
    const cursor = decodeCursor(value);
    if (!cursor) ctx.addIssue({ code: 'custom', message: 'is not a position this list gave out' });
    return cursor ?? undefined;
  }),
});

export function emailsRouter({ db }: AppContext) {
  const router = Router();
  router.use('/api/emails', requireRole(...officeRoles));
  router.get(
    '/api/emails',
    handle({ query: listEmailsQuery }, async ({ query }) => (await listEmails(db, query)) satisfies EmailLogPage<Date>),
  );
  router.get(
    '/api/emails/:id',
    handle({ params: uuidParam }, async ({ params }) => ({
      email: (await getEmail(db, params.id)) satisfies EmailDetailView<Date>,
    })),
  );
  router.post(
    '/api/emails/retry-dead',
    handle({}, async () => retryAllDead(db)),
  );
  router.post(
    '/api/emails/:id/retry',
    handle({ params: uuidParam }, async ({ params }) => ({ email: await retryEmail(db, params.id) })),
  );
  return router;
}
