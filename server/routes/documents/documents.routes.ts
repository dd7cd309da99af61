import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { documentLink, listDocuments, setShared } from '../../services/documents/documents.service';

const documentParams = z.object({ id: z.uuid('must be a valid id'), documentId: z.uuid('must be a valid id') });

export const updateDocumentInputSchema = z.strictObject({ sharedWithApplicant: z.boolean('must be true or false') });

export function documentsRouter(ctx: AppContext) {
  const router = Router();
  router.get(
    '/api/requests/:id/documents',
    handle({ params: uuidParam }, async ({ params, user }) => ({
      documents: await listDocuments(ctx, user, params.id),
    })),
  );
  router.get(
    '/api/requests/:id/documents/:documentId/url',
    handle({ params: documentParams }, async ({ params, user }) =>
      documentLink(ctx, user, params.id, params.documentId),
    ),
  );
  router.patch(
    '/api/documents/:id',
    requireRole(...officeRoles),
    handle({ params: uuidParam, body: updateDocumentInputSchema }, async ({ params, body, user }) => ({
      document: await setShared(ctx.db, user, params.id, body.sharedWithApplicant),
    })),
  );
  return router;
}
