import { warpStakeColumns, warpStakeRows, warpWords } from '@shared/charts/check-words';
import type { GradeCheck } from '../grade-checks/grade-checks.service';
import { drawTable, heading, paragraph } from './pdf-table';

const widths = [58, 62, 70, 78, 78, 70, 78];

/** The warped apron: what turns over what length, and the stakes along both edges. Only for checks that took it. */
export function apronSection(doc: PDFKit.PDFDocument, check: GradeCheck) {
  const apron = check.results.report.apron;
  if (!apron) return;
  heading(doc, 'Entrance edges and warp stakes');
  paragraph(doc, `${warpWords(apron)} The grade and break checks on both edges are in the findings above.`);
  drawTable(
    doc,
    warpStakeColumns.map((title, i) => ({
      title,
      width: widths[i],
      align: i === 0 || i === 2 || i === 5 ? undefined : ('right' as const),
    })),
    warpStakeRows(apron),
  );
}
