import { Router } from 'express';
import {
  createRateCardInputSchema,
  updateRateCardInputSchema,
  type RateCardAnswer,
  type RateCardsAnswer,
} from '@shared/contracts/rate-cards';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import {
  createRateCardDraft,
  listRateCards,
  publishRateCard,
  rateCardView,
  updateRateCardDraft,
} from '../../services/rate-cards/rate-cards.service';

/** The office reads the prices its quotes come from; only admins set them. */
export function rateCardsRouter({ db }: AppContext) {
  const router = Router();
  const admin = requireRole('admin');
  router.use('/api/rate-cards', requireRole(...officeRoles));

  router.get(
    '/api/rate-cards',
    handle({}, async () => (await listRateCards(db)) satisfies RateCardsAnswer<Date>),
  );
  router.post(
    '/api/rate-cards',
    admin,
    handle({ body: createRateCardInputSchema }, async ({ body, user, res }) => {
      res.status(201);
      const draft = await createRateCardDraft(db, user, body.fromVersionId);
      return { rateCard: rateCardView(draft, null) } satisfies RateCardAnswer<Date>;
    }),
  );
  router.put(
    '/api/rate-cards/:id',
    admin,
    handle(
      { params: uuidParam, body: updateRateCardInputSchema },
      async ({ params, body }) =>
        ({
          rateCard: rateCardView(await updateRateCardDraft(db, params.id, body), null),
        }) satisfies RateCardAnswer<Date>,
    ),
  );
  router.post(
    '/api/rate-cards/:id/publish',
    admin,
    handle({ params: uuidParam }, async ({ params, user }) => {
      const saved = await publishRateCard(db, user, params.id);
      const { currentId } = await listRateCards(db);
      return { rateCard: rateCardView(saved, currentId) } satisfies RateCardAnswer<Date>;
    }),
  );
  return router;
}
