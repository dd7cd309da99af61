import { Router } from 'express';
import {
  acceptQuoteInputSchema,
  createQuoteInputSchema,
  declineQuoteInputSchema,
  updateQuoteInputSchema,
  type QuoteAnswer,
  type QuotesAnswer,
} from '@shared/contracts/quotes';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import {
  acceptQuote,
  createQuote,
  declineQuote,
  discardDraft,
  listQuotes,
  quotePdf,
  quoteViewOf,
  sendQuote,
  updateQuote,
} from '../../services/quotes/quotes.service';

/** The office drafts and sends quotes; the request's owner reads and answers them. Crews have no part in the price. */
export function quotesRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router();
  const office = requireRole(...officeRoles);
  const owner = requireRole('applicant');
  const reader = requireRole('applicant', ...officeRoles);

  router.get(
    '/api/requests/:id/quotes',
    reader,
    handle(
      { params: uuidParam },
      async ({ params, user }) => (await listQuotes(db, user, params.id)) satisfies QuotesAnswer<Date>,
    ),
  );
  router.post(
    '/api/requests/:id/quotes',
    office,
    handle({ params: uuidParam, body: createQuoteInputSchema }, async ({ params, body, user, res }) => {
      const row = await createQuote(db, user, params.id, body);
      res.status(201);
      return { quote: await quoteViewOf(db, row) } satisfies QuoteAnswer<Date>;
    }),
  );
  router.put(
    '/api/quotes/:id',
    office,
    handle(
      { params: uuidParam, body: updateQuoteInputSchema },
      async ({ params, body, user }) =>
        ({
          quote: await quoteViewOf(db, await updateQuote(db, user, params.id, body)),
        }) satisfies QuoteAnswer<Date>,
    ),
  );
  router.delete(
    '/api/quotes/:id',
    office,
    handle({ params: uuidParam }, async ({ params, user }) => {
      await discardDraft(db, user, params.id);
    }),
  );
  router.get(
    '/api/quotes/:id/pdf',
    reader,
    handle({ params: uuidParam }, async ({ params, user, res }) => {
      const { pdf, quote, request } = await quotePdf(db, user, params.id);
      res
        .status(200)
        .type('application/pdf')
        .setHeader('Content-Disposition', `inline; filename="${request.reference}-quote-${quote.version}.pdf"`)
        .setHeader('Cache-Control', 'no-store')
        .send(pdf);
    }),
  );
  router.post(
    '/api/quotes/:id/send',
    office,
    handle(
      { params: uuidParam },
      async ({ params, user }) =>
        ({
          quote: await quoteViewOf(db, await sendQuote(ctx, user, params.id)),
        }) satisfies QuoteAnswer<Date>,
    ),
  );
  router.post(
    '/api/quotes/:id/accept',
    owner,
    handle(
      { params: uuidParam, body: acceptQuoteInputSchema },
      async ({ params, body, user }) =>
        ({
          quote: await quoteViewOf(db, await acceptQuote(ctx, user, params.id, body)),
        }) satisfies QuoteAnswer<Date>,
    ),
  );
  router.post(
    '/api/quotes/:id/decline',
    owner,
    handle(
      { params: uuidParam, body: declineQuoteInputSchema },
      async ({ params, body, user }) =>
        ({
          quote: await quoteViewOf(db, await declineQuote(ctx, user, params.id, body)),
        }) satisfies QuoteAnswer<Date>,
    ),
  );
  return router;
}
