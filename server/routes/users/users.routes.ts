import { Router } from 'express';
import { z } from 'zod';
import { roleSchema } from '../../../shared/workflow/statuses';
import { inviteUser, listUsers, setUserAccess } from '../../auth/users.service';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { requireRole } from '../../middleware/require-role';

export const listUsersQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  role: roleSchema.optional(),
});
export const updateUserInputSchema = z.strictObject({
  role: roleSchema.optional(),
  disabled: z.boolean().optional(),
}).refine((change) => change.role !== undefined || change.disabled !== undefined, { message: 'say what to change: role or disabled' });
export const inviteUserInputSchema = z.strictObject({
  email: z.email('must be an e-mail address').max(200),
  name: z.string().trim().min(1, 'is required').max(120),
  role: roleSchema,
});

export function usersRouter({ db }: AppContext) {
  const router = Router();
  router.use('/api/users', requireRole('admin'));
  router.get('/api/users', handle({ query: listUsersQuerySchema }, async ({ query }) => ({ users: await listUsers(db, query) })));
  router.post('/api/users', handle({ body: inviteUserInputSchema }, async ({ body, res }) => {
    res.status(201);
    return { user: await inviteUser(db, body) };
  }));
  router.patch('/api/users/:id', handle({ params: uuidParam, body: updateUserInputSchema }, async ({ params, body, user }) => ({
    user: await setUserAccess(db, user, params.id, body),
  })));
  return router;
}
