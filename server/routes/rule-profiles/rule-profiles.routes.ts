import { Router } from 'express';
import {
  createJurisdictionInputSchema,
  createVersionInputSchema,
  updateVersionInputSchema,
  type JurisdictionSummary,
} from '@shared/contracts/rule-profiles';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import {
  createDraft,
  createJurisdiction,
  listJurisdictions,
  loadJurisdiction,
  loadVersion,
  publishVersion,
  updateDraft,
} from '../../services/rule-profiles/rule-profiles.service';

/** Staff read the limits they check against; only admins change them. */
export function ruleProfilesRouter({ db }: AppContext) {
  const router = Router();
  const admin = requireRole('admin');
  router.use(['/api/jurisdictions', '/api/rule-profile-versions'], requireRole(...officeRoles));

  router.get(
    '/api/jurisdictions',
    handle({}, async () => ({
      jurisdictions: (await listJurisdictions(db)) satisfies JurisdictionSummary<Date>[],
    })),
  );
  router.post(
    '/api/jurisdictions',
    admin,
    handle({ body: createJurisdictionInputSchema }, async ({ body, user, res }) => {
      res.status(201);
      return await createJurisdiction(db, user, body);
    }),
  );
  router.get(
    '/api/jurisdictions/:id',
    handle({ params: uuidParam }, async ({ params }) => ({
      jurisdiction: await loadJurisdiction(db, params.id),
    })),
  );
  router.post(
    '/api/jurisdictions/:id/versions',
    admin,
    handle({ params: uuidParam, body: createVersionInputSchema }, async ({ params, body, user, res }) => {
      res.status(201);
      return { version: await createDraft(db, user, params.id, body.fromVersionId) };
    }),
  );
  router.get(
    '/api/rule-profile-versions/:id',
    handle({ params: uuidParam }, async ({ params }) => ({
      version: await loadVersion(db, params.id),
    })),
  );
  router.put(
    '/api/rule-profile-versions/:id',
    admin,
    handle({ params: uuidParam, body: updateVersionInputSchema }, async ({ params, body }) => ({
      version: await updateDraft(db, params.id, body),
    })),
  );
  router.post(
    '/api/rule-profile-versions/:id/publish',
    admin,
    handle({ params: uuidParam }, async ({ params, user }) => ({
      version: await publishVersion(db, user, params.id),
    })),
  );
  return router;
}
