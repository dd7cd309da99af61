import { sharedPaths } from '@shared/paths';
import { formatDay } from '@shared/format/dates';
import { formatCents } from '@shared/money/money';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';

interface RequestPart {
  id: string;
  reference: string;
  siteAddress: string;
}
interface QuotePart {
  version: number;
  totalCents: number;
  depositCents: number;
  validUntil: string;
  lines: { description: string; amountCents: number }[];
}

function email(to: string, template: string, subject: string, requestId: string, content: EmailContent): OutgoingEmail {
  return {
    to,
    template,
    subject,
    requestId,
    text: renderText(content, requestFooter),
    html: renderHtml(content, requestFooter),
  };
}

/** To the owner when the office sends a quote (a first one or a revision), with its PDF attached. */
export function quoteSentEmail(input: {
  request: RequestPart;
  owner: { email: string; name: string };
  quote: QuotePart;
  replacedVersion: number | null;
  appOrigin: string;
  pdf: Buffer;
}): OutgoingEmail {
  const { request, quote } = input;
  const lines = quote.lines.map((l) => `• ${l.description}: ${formatCents(l.amountCents)}`);
  const message = email(
    input.owner.email,
    'quote.sent',
    `${request.reference}: your quote${quote.version > 1 ? ` (version ${quote.version})` : ''} for the driveway entrance`,
    request.id,
    {
      greeting: `Hello ${input.owner.name},`,
      paragraphs: [
        `Here is our quote for the driveway entrance at ${request.siteAddress} (${request.reference}), version ${quote.version}.` +
          (input.replacedVersion === null ? '' : ` It replaces version ${input.replacedVersion}.`),
        ...lines,
        `Total ${formatCents(quote.totalCents)}, with a deposit of ${formatCents(quote.depositCents)} on acceptance. Valid until ${formatDay(quote.validUntil)}.`,
        'The quote is attached as a PDF. Open the request page to accept it by typing your name, decline it with a reason, or ask us a question in the messages.',
      ],
      link: { href: input.appOrigin + sharedPaths.applicantRequest.getHref(request.id), label: 'Read the quote' },
    },
  );
  return {
    ...message,
    attachments: [
      {
        filename: `${request.reference}-quote-version-${quote.version}.pdf`,
        contentType: 'application/pdf',
        content: input.pdf.toString('base64'),
        encoding: 'base64',
      },
    ],
  };
}

/** To the office when the owner accepts or declines. */
export function quoteAnsweredEmail(input: {
  request: RequestPart;
  quote: QuotePart;
  answer: { kind: 'accepted'; name: string } | { kind: 'declined'; reason: string };
  ownerName: string;
  officeEmail: string;
  appOrigin: string;
}): OutgoingEmail {
  const { request, quote, answer } = input;
  const accepted = answer.kind === 'accepted';
  return email(
    input.officeEmail,
    accepted ? 'quote.accepted' : 'quote.declined',
    `[${request.reference}] Quote version ${quote.version} ${accepted ? 'accepted' : 'declined'} by ${input.ownerName}`,
    request.id,
    {
      greeting: 'Hello office,',
      paragraphs: accepted
        ? [
            `${input.ownerName} accepted quote version ${quote.version} for ${request.siteAddress}, typing the name “${answer.name}”.`,
            `Total ${formatCents(quote.totalCents)}; deposit ${formatCents(quote.depositCents)}.`,
          ]
        : [
            `${input.ownerName} declined quote version ${quote.version} for ${request.siteAddress}.`,
            `Their reason: “${answer.reason}”`,
          ],
      link: { href: input.appOrigin + sharedPaths.officeRequest.getHref(request.id), label: 'Open the request' },
    },
  );
}
