import { Router } from 'express';
import { z } from 'zod';
import { ruleProfileSchema } from '../../../shared/engine';
import type { AppContext } from '../../context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import {
  createDraft, createJurisdiction, listJurisdictions, loadJurisdiction, loadVersion, publishVersion, updateDraft,
} from './rule-profiles.service';

const text = (max: number) => z.string().trim().min(1, 'is required').max(max, `must be at most ${max} characters`);

export const createJurisdictionInputSchema = z.strictObject({ name: text(120), authority: text(200) });
export const createDraftInputSchema = z.strictObject({ fromVersionId: z.uuid('must be a valid version id').optional() });
export const updateDraftInputSchema = z.strictObject({
  profile: ruleProfileSchema,
  changeNote: z.string().trim().max(1000, 'must be at most 1000 characters').optional(),
});

/** Staff read the limits they check against; only admins change them. */
export function ruleProfilesRouter({ db }: AppContext) {
  const router = Router();
  const admin = requireRole('admin');
  router.use(['/api/jurisdictions', '/api/rule-profile-versions'], requireRole(...officeRoles));

  router.get('/api/jurisdictions', handle({}, async () => ({ jurisdictions: await listJurisdictions(db) })));
  router.post('/api/jurisdictions', admin, handle({ body: createJurisdictionInputSchema }, async ({ body, user, res }) => {
    res.status(201);
    return await createJurisdiction(db, user, body);
  }));
  router.get('/api/jurisdictions/:id', handle({ params: uuidParam }, async ({ params }) => ({
    jurisdiction: await loadJurisdiction(db, params.id),
  })));
  router.post('/api/jurisdictions/:id/versions', admin, handle({ params: uuidParam, body: createDraftInputSchema }, async ({ params, body, user, res }) => {
    res.status(201);
    return { version: await createDraft(db, user, params.id, body.fromVersionId) };
  }));
  router.get('/api/rule-profile-versions/:id', handle({ params: uuidParam }, async ({ params }) => ({
    version: await loadVersion(db, params.id),
  })));
  router.put('/api/rule-profile-versions/:id', admin, handle({ params: uuidParam, body: updateDraftInputSchema }, async ({ params, body }) => ({
    version: await updateDraft(db, params.id, body),
  })));
  router.post('/api/rule-profile-versions/:id/publish', admin, handle({ params: uuidParam }, async ({ params, user }) => ({
    version: await publishVersion(db, user, params.id),
  })));
  return router;
}
