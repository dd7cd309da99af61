import express, { Router } from 'express';
import {
  balanceChangeInputSchema,
  checkoutReturnInputSchema,
  offlinePaymentInputSchema,
  paymentListQuerySchema,
  paymentWaitsSchema,
  paymentWebhookPath,
  refundInputSchema,
  startCheckoutInputSchema,
  type CheckoutAnswer,
  type PaymentListAnswer,
  type PaymentWaits,
  type RequestPaymentsView,
} from '@shared/contracts/payments';
import type { AppContext } from '../../config/context';
import { handle, uuidParam } from '../../lib/handle';
import { officeRoles, requireRole } from '../../middleware/require-role';
import { confirmReturn, startCheckout } from '../../services/payments/checkout.service';
import {
  addBalanceChange,
  recordOfflinePayment,
  refundPayment,
  requestPayments,
} from '../../services/payments/office-payments.service';
import { loadPaymentWaits, savePaymentWaits } from '../../services/payments/payment-waits.service';
import { listPayments, paymentsCsv } from '../../services/payments/payments-list.service';
import { takeWebhook } from '../../services/payments/webhook.service';

/**
 * The provider's notices. Mounted before the JSON parser, sessions and the same-origin check: the signature is over
 * the exact bytes, and the sender is the provider, not a signed-in browser.
 */
export function paymentWebhookRouter(ctx: AppContext) {
  const router = Router();
  router.post(paymentWebhookPath, express.raw({ type: () => true, limit: '256kb' }), async (req, res, next) => {
    try {
      const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
      res.json(await takeWebhook(ctx, body, req.headers['stripe-signature'] as string | undefined));
    } catch (error) {
      next(error);
    }
  });
  return router;
}

export function paymentsRouter(ctx: AppContext) {
  const router = Router();
  const office = requireRole(...officeRoles);

  router.get(
    '/api/requests/:id/payments',
    requireRole('applicant', ...officeRoles),
    handle(
      { params: uuidParam },
      async ({ params, user }) => (await requestPayments(ctx, user, params.id)) satisfies RequestPaymentsView<Date>,
    ),
  );
  router.post(
    '/api/requests/:id/payments/checkout',
    requireRole('applicant'),
    handle(
      { params: uuidParam, body: startCheckoutInputSchema },
      async ({ params, body, user }) => (await startCheckout(ctx, user, params.id, body.kind)) satisfies CheckoutAnswer,
    ),
  );
  router.post(
    '/api/requests/:id/payments/return',
    requireRole('applicant'),
    handle({ params: uuidParam, body: checkoutReturnInputSchema }, async ({ params, body, user }) => {
      await confirmReturn(ctx, user, params.id, body.sessionId);
      return (await requestPayments(ctx, user, params.id)) satisfies RequestPaymentsView<Date>;
    }),
  );
  router.post(
    '/api/requests/:id/payments/offline',
    office,
    handle({ params: uuidParam, body: offlinePaymentInputSchema }, async ({ params, body, user, res }) => {
      await recordOfflinePayment(ctx, user, params.id, body);
      res.status(201);
      return (await requestPayments(ctx, user, params.id)) satisfies RequestPaymentsView<Date>;
    }),
  );
  router.post(
    '/api/requests/:id/payments/changes',
    office,
    handle({ params: uuidParam, body: balanceChangeInputSchema }, async ({ params, body, user, res }) => {
      await addBalanceChange(ctx, user, params.id, body);
      res.status(201);
      return (await requestPayments(ctx, user, params.id)) satisfies RequestPaymentsView<Date>;
    }),
  );
  router.post(
    '/api/payments/:id/refund',
    requireRole('admin'),
    handle({ params: uuidParam, body: refundInputSchema }, async ({ params, body, user }) => {
      const refunded = await refundPayment(ctx, user, params.id, body.note);
      return (await requestPayments(ctx, user, refunded.requestId)) satisfies RequestPaymentsView<Date>;
    }),
  );
  router.get(
    '/api/payments',
    office,
    handle(
      { query: paymentListQuerySchema },
      async ({ query }) => (await listPayments(ctx, query.state)) satisfies PaymentListAnswer<Date>,
    ),
  );
  router.get(
    '/api/payments/export.csv',
    office,
    handle({ query: paymentListQuerySchema }, async ({ query, res }) => {
      const csv = paymentsCsv(await listPayments(ctx, query.state));
      res.setHeader('content-type', 'text/csv; charset=utf-8');
      res.setHeader('content-disposition', `attachment; filename="gradepass-payments-${query.state}.csv"`);
      res.send(csv);
    }),
  );
  router.get(
    '/api/settings/payment-waits',
    office,
    handle({}, async () => (await loadPaymentWaits(ctx.db)) satisfies PaymentWaits),
  );
  router.put(
    '/api/settings/payment-waits',
    requireRole('admin'),
    handle(
      { body: paymentWaitsSchema },
      async ({ body }) => (await savePaymentWaits(ctx.db, body)) satisfies PaymentWaits,
    ),
  );
  return router;
}
