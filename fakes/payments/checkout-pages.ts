import express, { Router, type Response } from 'express';
import { randomBytes } from 'node:crypto';
import { escapeHtml, page } from '../lib/html.js';
import type { CheckoutSession, PaymentsStore } from './payments-store.js';

/** Card numbers the page knows (spaces allowed): one pays, one is refused, one asks the payer to confirm first. */
export const testCards = {
  pays: '4242424242424242',
  refused: '4000000000000002',
  confirms: '4000002500003155',
} as const;

const pagePolicy =
  "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; base-uri 'none'; frame-ancestors 'none'";

const money = (cents: number, currency: string) =>
  `${currency === 'usd' ? '$' : `${currency.toUpperCase()} `}${Math.floor(cents / 100).toLocaleString('en-US')}.${String(cents % 100).padStart(2, '0')}`;

const extraCss = `
  .card { background: #fff; border: 1px solid var(--line); border-radius: 0.5rem; padding: 1.25rem; max-width: 30rem; }
  .total { font-size: 1.5rem; font-weight: 700; margin: 0.25rem 0 1rem; }
  .row { display: flex; gap: 0.75rem; } .row > div { flex: 1; }
  .actions { margin-top: 1.25rem; display: flex; gap: 0.75rem; align-items: center; flex-wrap: wrap; }
  .note { font-size: 0.875rem; }
`;

interface PageOptions {
  store: PaymentsStore;
  findSession: (id: string) => CheckoutSession;
  pay: (session: CheckoutSession) => void;
}

/** The payer's side: the card form, the extra confirmation and the way back to the app. */
export function checkoutPages({ store, findSession, pay }: PageOptions): Router {
  const router = Router();
  const form = express.urlencoded({ extended: false, limit: '8kb' });
  /** Confirmation steps waiting for the payer's answer, by session; each token works once. */
  const confirmations = new Map<string, string>();

  const send = (res: Response, status: number, title: string, body: string) => {
    res
      .status(status)
      .setHeader('content-security-policy', pagePolicy)
      .type('html')
      .send(page(title, body, extraCss));
  };
  const lookup = (id: string) => {
    try {
      return findSession(id);
    } catch {
      return undefined;
    }
  };
  const closed = (res: Response, session: CheckoutSession | undefined) => {
    if (!session)
      return send(
        res,
        404,
        'Payment page not found',
        '<h1>Payment page not found</h1><p>This link does not lead to a payment.</p>',
      );
    if (session.status === 'complete') {
      return send(
        res,
        200,
        'Already paid',
        `<h1>Already paid</h1><p>${escapeHtml(money(session.amount_total, session.currency))} was paid on this page.</p>
         <p><a class="button" href="${escapeHtml(returnUrl(session))}">Back to Gradepass</a></p>`,
      );
    }
    return send(
      res,
      410,
      'Payment page expired',
      `<h1>This payment page has expired</h1><p>Nothing was charged. Start again from the request page to get a new one.</p>
       ${session.cancel_url ? `<p><a class="button" href="${escapeHtml(session.cancel_url)}">Back to Gradepass</a></p>` : ''}`,
    );
  };

  // Browsers ask for an icon on every page; answering "nothing here" keeps their consoles quiet.
  router.get('/favicon.ico', (_req, res) => {
    res.status(204).end();
  });

  router.get('/pay/:id', (req, res) => {
    const session = lookup(req.params.id);
    if (!session || session.status !== 'open') return closed(res, session);
    send(res, 200, 'Pay by card', cardForm(session));
  });

  router.post('/pay/:id', form, (req, res) => {
    const session = lookup(req.params.id);
    if (!session || session.status !== 'open') return closed(res, session);
    const card = String(req.body?.card ?? '').replace(/[\s-]/g, '');
    const expiry = String(req.body?.expiry ?? '').trim();
    const code = String(req.body?.code ?? '').trim();
    const problem = !/^\d{12,19}$/.test(card)
      ? 'Card number: enter the 12 to 19 digits on the front of the card.'
      : !/^(0[1-9]|1[0-2]) ?\/ ?\d{2}$/.test(expiry)
        ? 'Expiry: enter the month and year as MM/YY.'
        : !/^\d{3,4}$/.test(code)
          ? 'Security code: enter the 3 or 4 digits on the back.'
          : card === testCards.refused
            ? 'The card was refused by its bank. Nothing was charged; try another card.'
            : card !== testCards.pays && card !== testCards.confirms
              ? 'The card was refused: this local stand-in knows only the test card numbers listed below.'
              : null;
    if (problem) return send(res, 402, 'Pay by card', cardForm(session, problem));
    if (card === testCards.confirms) {
      const token = randomBytes(16).toString('hex');
      confirmations.set(session.id, token);
      return send(res, 200, 'Confirm the payment', confirmForm(session, token));
    }
    pay(session);
    res.redirect(303, returnUrl(session));
  });

  router.post('/pay/:id/confirm', form, (req, res) => {
    const session = lookup(req.params.id);
    if (!session || session.status !== 'open') return closed(res, session);
    const token = confirmations.get(session.id);
    if (!token || token !== req.body?.token) {
      return send(
        res,
        400,
        'Pay by card',
        cardForm(session, 'That confirmation is no longer valid; enter the card again.'),
      );
    }
    confirmations.delete(session.id);
    if (req.body?.decision !== 'approve') {
      return send(res, 402, 'Pay by card', cardForm(session, 'The payment was not confirmed, so nothing was charged.'));
    }
    pay(session);
    res.redirect(303, returnUrl(session));
  });

  // The stand-in's own overview, for a developer: every session and what became of its webhooks.
  router.get('/', (_req, res) => {
    const sessions = Object.values(store.state.sessions).sort((a, b) => b.created - a.created);
    const deliveries = Object.values(store.state.deliveries).reverse();
    send(
      res,
      200,
      'Payments stand-in',
      `<h1>Payments stand-in</h1>
       <h2>Payment pages</h2>
       <table><thead><tr><th>Page</th><th>Amount</th><th>State</th><th>For</th></tr></thead><tbody>
       ${sessions
         .map(
           (s) => `<tr><td><a href="/pay/${escapeHtml(s.id)}">${escapeHtml(s.id)}</a></td>
             <td>${escapeHtml(money(s.amount_total, s.currency))}</td><td>${escapeHtml(s.status)}</td>
             <td>${escapeHtml(s.line_items_shown.map((l) => l.name).join(', '))}</td></tr>`,
         )
         .join('')}
       </tbody></table>
       <h2>Notices sent to the app</h2>
       <table><thead><tr><th>Event</th><th>Type</th><th>Tries</th><th>Outcome</th></tr></thead><tbody>
       ${deliveries
         .map(
           (d) => `<tr><td>${escapeHtml(d.eventId)}</td><td>${escapeHtml(d.type)}</td><td>${d.attempts}</td>
             <td>${d.delivered ? 'delivered' : escapeHtml(d.lastError ?? 'waiting')}</td></tr>`,
         )
         .join('')}
       </tbody></table>`,
    );
  });

  return router;
}

function returnUrl(session: CheckoutSession) {
  return session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
}

function cardForm(session: CheckoutSession, problem?: string) {
  const lines = session.line_items_shown
    .map(
      (l) =>
        `<li>${escapeHtml(l.name)}${l.quantity > 1 ? ` × ${l.quantity}` : ''}: ${escapeHtml(money(l.amount * l.quantity, session.currency))}</li>`,
    )
    .join('');
  return `<h1>Pay by card</h1>
  <div class="card">
    <p class="muted">Amount to pay</p>
    <p class="total" data-testid="amount">${escapeHtml(money(session.amount_total, session.currency))}</p>
    <ul>${lines}</ul>
    ${problem ? `<p class="error" role="alert">${escapeHtml(problem)}</p>` : ''}
    <form method="post" action="/pay/${escapeHtml(session.id)}">
      <label for="card">Card number</label>
      <input type="text" id="card" name="card" inputmode="numeric" autocomplete="cc-number" required>
      <div class="row">
        <div><label for="expiry">Expiry (MM/YY)</label>
          <input type="text" id="expiry" name="expiry" autocomplete="cc-exp" placeholder="MM/YY" required></div>
        <div><label for="code">Security code</label>
          <input type="text" id="code" name="code" inputmode="numeric" autocomplete="cc-csc" required></div>
      </div>
      <div class="actions">
        <button type="submit">Pay ${escapeHtml(money(session.amount_total, session.currency))}</button>
        ${session.cancel_url ? `<a href="${escapeHtml(session.cancel_url)}">Go back without paying</a>` : ''}
      </div>
    </form>
    <p class="note muted">Local stand-in: no money moves. Card ${testCards.pays.replace(/(\d{4})(?=\d)/g, '$1 ')} pays,
      ${testCards.refused.replace(/(\d{4})(?=\d)/g, '$1 ')} is refused, and
      ${testCards.confirms.replace(/(\d{4})(?=\d)/g, '$1 ')} asks you to confirm first. Any future expiry and any
      3-digit code.</p>
  </div>`;
}

function confirmForm(session: CheckoutSession, token: string) {
  return `<h1>Confirm the payment</h1>
  <div class="card">
    <p>The card's bank asks you to confirm a payment of
      <strong>${escapeHtml(money(session.amount_total, session.currency))}</strong>.</p>
    <form method="post" action="/pay/${escapeHtml(session.id)}/confirm">
      <input type="hidden" name="token" value="${escapeHtml(token)}">
      <div class="actions">
        <button type="submit" name="decision" value="approve">Yes, I confirm</button>
        <button type="submit" name="decision" value="refuse" class="secondary">No, do not pay</button>
      </div>
    </form>
  </div>`;
}
