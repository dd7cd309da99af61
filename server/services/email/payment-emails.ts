import { paymentKindLabels, type PaymentKind, type PaymentMethod } from '@shared/contracts/payments';
import { formatCents } from '@shared/money/money';
import { sharedPaths } from '@shared/paths';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';

export interface ReceiptInput {
  request: { id: string; reference: string; siteAddress: string };
  owner: { email: string; name: string };
  kind: PaymentKind;
  method: PaymentMethod;
  amountCents: number;
  /** When it was paid or refunded, already in words ("Dec 2, 2026"). */
  day: string;
  /** The payment's id, printed as the receipt number. */
  receiptNumber: string;
  note: string;
  appOrigin: string;
  /** What is still owed after this, in words. */
  whatNext: string;
}

const how = (method: PaymentMethod) => (method === 'card' ? 'by card, online' : 'as recorded by the office');

function build(input: ReceiptInput, template: string, subject: string, content: EmailContent): OutgoingEmail {
  return {
    to: input.owner.email,
    template,
    subject,
    requestId: input.request.id,
    text: renderText(content, requestFooter),
    html: renderHtml(content, requestFooter),
  };
}

/** The owner's receipt for a deposit or a balance, however it was paid. */
export function paymentReceiptEmail(input: ReceiptInput): OutgoingEmail {
  const what = paymentKindLabels[input.kind].toLowerCase();
  const paragraphs = [
    `Thank you: we received your ${what} of ${formatCents(input.amountCents)} for request ${input.request.reference} (${input.request.siteAddress}), paid ${how(input.method)} on ${input.day}.`,
    `Receipt number: ${input.receiptNumber}`,
  ];
  if (input.note) paragraphs.push(`Note: ${input.note}`);
  paragraphs.push(input.whatNext);
  return build(
    input,
    `payment.receipt.${input.kind}`,
    `Receipt: ${what} of ${formatCents(input.amountCents)} for ${input.request.reference}`,
    {
      greeting: `Hello ${input.owner.name},`,
      paragraphs,
      link: {
        href: input.appOrigin + sharedPaths.applicantRequest.getHref(input.request.id),
        label: 'See your request',
      },
    },
  );
}

/** The owner's notice that a payment went back to them. */
export function refundReceiptEmail(input: ReceiptInput): OutgoingEmail {
  const what = paymentKindLabels[input.kind].toLowerCase();
  const paragraphs = [
    `We have refunded your ${what} of ${formatCents(input.amountCents)} for request ${input.request.reference} (${input.request.siteAddress}) on ${input.day}.`,
    input.method === 'card'
      ? 'The money goes back to the card you paid with; your bank decides when it shows on your statement.'
      : 'The office returns it the way you paid; ask the office if you have questions.',
    `Receipt number: ${input.receiptNumber}`,
  ];
  if (input.note) paragraphs.push(`Reason: ${input.note}`);
  return build(
    input,
    'payment.refund',
    `Refund: ${what} of ${formatCents(input.amountCents)} for ${input.request.reference}`,
    {
      greeting: `Hello ${input.owner.name},`,
      paragraphs,
      link: {
        href: input.appOrigin + sharedPaths.applicantRequest.getHref(input.request.id),
        label: 'See your request',
      },
    },
  );
}
