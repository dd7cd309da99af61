import { reportFonts } from './pdf-fonts';

export interface Column {
  title: string;
  width: number;
  align?: 'left' | 'right';
}

const PAD = 3;

function ensureRoom(doc: PDFKit.PDFDocument, needed: number) {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

/** A plain ruled table that breaks across pages and repeats its header; rows grow to fit wrapped text. */
export function drawTable(
  doc: PDFKit.PDFDocument,
  columns: Column[],
  rows: string[][],
  opts: { highlight?: (row: number) => boolean } = {},
) {
  const left = doc.page.margins.left;
  const fontSize = 8;
  const header = () => {
    ensureRoom(doc, 40);
    const top = doc.y;
    doc.font(reportFonts.bold.name).fontSize(fontSize).fillColor('#0e2a1f');
    let x = left;
    let tallest = 0;
    for (const c of columns) {
      tallest = Math.max(tallest, doc.heightOfString(c.title, { width: c.width - 2 * PAD }));
      doc.text(c.title, x + PAD, top + PAD, { width: c.width - 2 * PAD, align: c.align ?? 'left' });
      x += c.width;
    }
    const bottom = top + tallest + 2 * PAD;
    doc.moveTo(left, bottom).lineTo(x, bottom).lineWidth(0.8).strokeColor('#1d4a38').stroke();
    doc.y = bottom;
  };
  header();
  rows.forEach((cells, i) => {
    doc.font(reportFonts.body.name).fontSize(fontSize);
    const height =
      Math.max(...cells.map((cell, j) => doc.heightOfString(cell, { width: columns[j].width - 2 * PAD }))) + 2 * PAD;
    if (doc.y + height > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      header();
      doc.font(reportFonts.body.name).fontSize(fontSize);
    }
    const top = doc.y;
    const total = columns.reduce((s, c) => s + c.width, 0);
    if (opts.highlight?.(i)) doc.rect(left, top, total, height).fill('#fbeee9');
    doc.fillColor('#1c1f1d');
    let x = left;
    cells.forEach((cell, j) => {
      doc.text(cell, x + PAD, top + PAD, { width: columns[j].width - 2 * PAD, align: columns[j].align ?? 'left' });
      x += columns[j].width;
    });
    doc
      .moveTo(left, top + height)
      .lineTo(left + total, top + height)
      .lineWidth(0.3)
      .strokeColor('#d6d3cd')
      .stroke();
    doc.y = top + height;
  });
  doc.x = left;
  doc.moveDown(0.8);
}

export function heading(doc: PDFKit.PDFDocument, text: string) {
  ensureRoom(doc, 60);
  doc.x = doc.page.margins.left;
  doc.font(reportFonts.bold.name).fontSize(12).fillColor('#0e2a1f').text(text);
  doc.moveDown(0.3);
  doc.font(reportFonts.body.name).fontSize(9).fillColor('#1c1f1d');
}

export function paragraph(doc: PDFKit.PDFDocument, text: string, opts: { italic?: boolean } = {}) {
  doc
    .font(opts.italic ? reportFonts.italic.name : reportFonts.body.name)
    .fontSize(9)
    .fillColor('#1c1f1d')
    .text(text, doc.page.margins.left, doc.y, {
      width: doc.page.width - doc.page.margins.left - doc.page.margins.right,
    });
  doc.moveDown(0.4);
}
