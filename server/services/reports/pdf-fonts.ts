import { createRequire } from 'node:module';
import path from 'node:path';

/**
 * Merriweather from @fontsource, which ships each weight as WOFF and WOFF2. pdfkit embeds WOFF (not WOFF2), and the
 * latin subset covers the report's text; anything outside it (e.g. the inequality signs) is avoided in the wording.
 */
const require = createRequire(import.meta.url);
const filesDir = path.join(path.dirname(require.resolve('@fontsource/merriweather/package.json')), 'files');
const file = (weight: number, style: 'normal' | 'italic') =>
  path.join(filesDir, `merriweather-latin-${weight}-${style}.woff`);

export const reportFonts = {
  body: { name: 'Merriweather', file: file(400, 'normal') },
  bold: { name: 'Merriweather-Bold', file: file(700, 'normal') },
  italic: { name: 'Merriweather-Italic', file: file(400, 'italic') },
} as const;

export function registerReportFonts(doc: PDFKit.PDFDocument) {
  for (const font of Object.values(reportFonts)) doc.registerFont(font.name, font.file);
  doc.font(reportFonts.body.name);
}

/** svg-to-pdfkit asks for a font per text element; the chart's labels use the same family as the report. */
export const chartFont = (_family: string, bold: boolean, italic: boolean) =>
  bold ? reportFonts.bold.name : italic ? reportFonts.italic.name : reportFonts.body.name;
