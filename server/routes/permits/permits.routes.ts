import { Router } from 'express';
import {
  letterConfirmInputSchema,
  letterUploadInputSchema,
  packetQuerySchema,
  type LetterConfirmAnswer,
  type LetterUploadAnswer,
} from '@shared/contracts/permits';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { confirmLetter, presignLetter } from '../../services/permits/decision-letters.service';
import { previewPacket } from '../../services/permits/permit-packet.service';

/** The permit packet the office sends the road authority, and the authority's letter back. Office only. */
export function permitsRouter(ctx: AppContext) {
  const router = Router();
  const office = requireRole(...officeRoles);
  router.get(
    '/api/requests/:id/permit-packet',
    office,
    handle({ params: uuidParam, query: packetQuerySchema }, async ({ params, query, user, res }) => {
      const { pdf, fileName } = await previewPacket(ctx, user, params.id, query.paper);
      res
        .status(200)
        .type('application/pdf')
        .set('Content-Disposition', `inline; filename="${fileName.replace(/[^\w.-]+/g, '-')}"`)
        .set('Cache-Control', 'no-store')
        .send(pdf);
    }),
  );
  router.post(
    '/api/requests/:id/decision-letters',
    office,
    handle(
      { params: uuidParam, body: letterUploadInputSchema },
      async ({ params, body, user }) => (await presignLetter(ctx, user, params.id, body)) satisfies LetterUploadAnswer,
    ),
  );
  router.post(
    '/api/requests/:id/decision-letters/confirm',
    office,
    handle({ params: uuidParam, body: letterConfirmInputSchema }, async ({ params, body, user }) => {
      const doc = await confirmLetter(ctx, user, params.id, body);
      return {
        document: {
          id: doc.id,
          kind: doc.kind,
          title: doc.title,
          contentType: doc.contentType,
          sizeBytes: doc.sizeBytes,
          createdAt: doc.createdAt,
        },
      } satisfies LetterConfirmAnswer<Date>;
    }),
  );
  return router;
}
