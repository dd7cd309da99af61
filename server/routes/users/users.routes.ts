import { Router } from 'express';
import {
  addPersonInputSchema,
  listPeopleQuerySchema,
  updatePersonInputSchema,
  type PersonView,
} from '@shared/contracts/people';
import { inviteUser, listUsers, setUserAccess } from '../../services/users/users.service';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { requireRole } from '../../middleware/require-role';

export function usersRouter({ db }: AppContext) {
  const router = Router();
  router.use('/api/users', requireRole('admin'));
  router.get(
    '/api/users',
    handle({ query: listPeopleQuerySchema }, async ({ query }) => ({
      users: (await listUsers(db, query)) satisfies PersonView<Date>[],
    })),
  );
  router.post(
    '/api/users',
    handle({ body: addPersonInputSchema }, async ({ body, res, user }) => {
      res.status(201);
      return { user: (await inviteUser(db, user, body)) satisfies PersonView<Date> };
    }),
  );
  router.patch(
    '/api/users/:id',
    handle({ params: uuidParam, body: updatePersonInputSchema }, async ({ params, body, user }) => ({
      user: (await setUserAccess(db, user, params.id, body)) satisfies PersonView<Date>,
    })),
  );
  return router;
}
