import PDFDocument from 'pdfkit';
import { SAFETY_CAUTIONS } from '@shared/engine';
import { formatDay } from '@shared/format/dates';
import { quantityWithUnit } from '@shared/format/counts';
import { formatBasisPoints, formatCents } from '@shared/money/money';
import type { QuoteLineView } from '@shared/contracts/quotes';
import { registerReportFonts, reportFonts } from './pdf-fonts';
import { drawTable, heading, paragraph } from './pdf-table';

export interface QuotePdfData {
  request: { reference: string; applicantName: string; siteAddress: string; roadName: string };
  quote: {
    version: number;
    status: string;
    lines: QuoteLineView[];
    subtotalCents: number;
    taxCents: number;
    totalCents: number;
    taxRateBp: number;
    depositRateBp: number;
    depositCents: number;
    terms: string;
    validUntil: string;
    sentAt: Date | null;
  };
  checkNumber: number;
  rateCardVersion: number;
  /** A preview says so across its top; a sent quote carries its date. */
  preview: boolean;
}

/** The quote as the owner receives it, built from the stored quote alone. */
export function buildQuotePdf(data: QuotePdfData): Promise<Buffer> {
  const { quote, request } = data;
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: 48,
    info: { Title: `Quote version ${quote.version} - ${request.reference}`, Author: 'Gradepass' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerReportFonts(doc);

  if (data.preview)
    doc.font(reportFonts.bold.name).fontSize(10).fillColor('#9a3412').text('PREVIEW: not sent to the owner yet');
  doc.font(reportFonts.bold.name).fontSize(18).fillColor('#0e2a1f').text(`Quote, version ${quote.version}`);
  doc
    .font(reportFonts.body.name)
    .fontSize(10)
    .fillColor('#1c1f1d')
    .text(`Request ${request.reference} · ${request.applicantName} · ${request.siteAddress} on ${request.roadName}`);
  doc.text(
    `${quote.sentAt ? `Sent ${formatDay(quote.sentAt, { timeZone: 'UTC' })}. ` : ''}Valid until ${formatDay(quote.validUntil)}. Quantities from grade check ${data.checkNumber}; prices from rate card version ${data.rateCardVersion}.`,
  );
  doc.moveDown(0.6);

  heading(doc, 'Lines');
  drawTable(
    doc,
    [
      { title: 'Description', width: 170 },
      { title: 'Where the quantity came from', width: 130 },
      { title: 'Quantity', width: 70, align: 'right' },
      { title: 'Unit price', width: 65, align: 'right' },
      { title: 'Amount', width: 81, align: 'right' },
    ],
    quote.lines.map((l) => [
      `${l.description}${l.taxable ? ' (taxed)' : ''}`,
      l.source || '-',
      quantityWithUnit(l.quantity, l.unit),
      formatCents(l.unitPriceCents),
      formatCents(l.amountCents),
    ]),
  );
  drawTable(
    doc,
    [
      { title: '', width: 435 },
      { title: '', width: 81, align: 'right' },
    ],
    [
      ['Subtotal', formatCents(quote.subtotalCents)],
      [`Sales tax at ${formatBasisPoints(quote.taxRateBp)} on the taxed lines`, formatCents(quote.taxCents)],
      ['Total', formatCents(quote.totalCents)],
      [
        `Deposit on acceptance (${formatBasisPoints(quote.depositRateBp)} of the total)`,
        formatCents(quote.depositCents),
      ],
      ['Balance on completion', formatCents(quote.totalCents - quote.depositCents)],
    ],
  );
  paragraph(
    doc,
    'Each line is its quantity times its unit price, rounded to the nearest cent (half a cent rounds up); tax and the deposit are each rounded the same way once.',
    { italic: true },
  );

  if (quote.terms) {
    heading(doc, 'Terms');
    paragraph(doc, quote.terms);
  }
  heading(doc, 'How to answer');
  paragraph(
    doc,
    'Accept or decline this quote on your request page in Gradepass, or ask the office a question in the messages there.',
  );
  heading(doc, 'Before any digging');
  // The cautions about digging; the last one speaks of a check, so the quote says its own version of it below.
  for (const caution of SAFETY_CAUTIONS.filter((c) => !c.startsWith('This check'))) paragraph(doc, `• ${caution}`);
  paragraph(
    doc,
    "Gradepass supports, and never replaces, the road authority's review, local codes and licensed engineering.",
    { italic: true },
  );
  doc.end();
  return done;
}
