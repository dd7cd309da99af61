import { countOf } from '@shared/format/counts';
import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { formatStation, type RuleProfile } from '@shared/engine';
import { profileChartSvg } from '@shared/charts/profile-chart';
import { chartInputFor } from '@shared/charts/chart-input';
import type { GradeCheck } from '../grade-checks/grade-checks.service';
import { chartFont, registerReportFonts, reportFonts } from './pdf-fonts';
import { drawTable, heading, paragraph } from './pdf-table';
import { apronSection } from './report-apron';
import { designSections } from './report-design';
import { findingCells, profileValueRows, reportCautions, withArticle } from './report-words';
import { formatDay } from '@shared/format/dates';

export interface ReportData {
  request: { reference: string; applicantName: string; siteAddress: string; roadName: string };
  check: GradeCheck;
  profile: RuleProfile;
  version: { version: number; publishedAt: Date | null };
  jurisdiction: { name: string; authority: string };
  /** The contractor whose office made the check, and the person who saved it. */
  companyName: string;
  checkedBy: string | null;
}

const dateText = (d: Date | null) => formatDay(d, { missing: '-' });

/** What was measured at the site, in one paragraph, so the report stands on its own. */
export function siteWords(check: Pick<GradeCheck, 'inputs' | 'results'>): string {
  const { road, sight, geometry, culvert } = check.inputs;
  const parts: string[] = [
    `Road edge at station ${formatStation(check.inputs.roadEdgeStationFt ?? check.results.report.profile.points[0].stationFt)}`,
  ];
  if (road) {
    parts.push(
      `road grade ${Math.abs(road.gradePercent)}% ${road.gradePercent >= 0 ? 'rising' : 'falling'} to the right facing into the property`,
    );
    parts.push(`road-edge elevation ${road.edgeElevationFt.toFixed(2)} ft`);
    if (road.crossSlopePercent !== undefined && !check.inputs.roadSide)
      parts.push(`cross slope ${road.crossSlopePercent}%`);
  }
  const side = check.inputs.roadSide;
  if (side) {
    parts.push(`road cross slope ${side.roadCrossSlopePercent}% toward the road edge`);
    if (side.shoulderWidthFt > 0)
      parts.push(`a ${side.shoulderWidthFt} ft shoulder at ${side.shoulderSlopePercent}% toward the road edge`);
  }
  if (sight?.speedMph !== undefined) parts.push(`speed ${sight.speedMph} mph`);
  if (geometry?.widthFt !== undefined) parts.push(`entrance ${geometry.widthFt} ft wide`);
  parts.push(
    culvert
      ? `${withArticle(`${culvert.diameterIn} in`)} culvert with inverts ${culvert.inletInvertFt.toFixed(2)} ft (inlet) and ${culvert.outletInvertFt.toFixed(2)} ft (outlet)`
      : 'no culvert',
  );
  const shots = check.results.surveyed?.profile.points.length ?? check.results.report.profile.points.length;
  parts.push(
    `${countOf(shots, 'centreline shot')}${check.inputs.design?.applied ? ', checked on the proposed profile' : ', checked as surveyed'}`,
  );
  return `${parts.join('; ')}.`;
}

/** The grade check as a PDF the owner, the crew and the road authority can read; built from the stored record only. */
export function buildGradeCheckReport(data: ReportData): Promise<Buffer> {
  const { check, profile } = data;
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: 48,
    info: { Title: `Grade check ${check.number} - ${data.request.reference}`, Author: data.companyName },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerReportFonts(doc);

  doc.font(reportFonts.bold.name).fontSize(18).fillColor('#0e2a1f').text(`Grade check ${check.number}`);
  doc.font(reportFonts.bold.name).fontSize(11).fillColor('#1c1f1d').text(data.companyName);
  doc
    .font(reportFonts.body.name)
    .fontSize(10)
    .fillColor('#1c1f1d')
    .text(
      `Request ${data.request.reference} · ${data.request.applicantName} · ${data.request.siteAddress} on ${data.request.roadName}`,
    );
  doc.text(
    `Checked ${dateText(check.createdAt)}${data.checkedBy ? ` by ${data.checkedBy}` : ''} against ${data.jurisdiction.name} (${data.jurisdiction.authority}), rule profile version ${data.version.version}, published ${dateText(data.version.publishedAt)}. Calculation version ${check.engineVersion}.`,
  );
  doc.moveDown(0.6);

  const { report } = check.results;
  heading(doc, 'Site and survey');
  paragraph(doc, siteWords(check));
  heading(doc, report.passes ? 'Result: meets the rules checked' : 'Result: does not yet meet the rules');
  paragraph(doc, check.summary);
  paragraph(doc, report.summary.text, { italic: true });

  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  // Drawn at the page's own size in points, so the labels print at the size they were set.
  const chartHeight = Math.round(width * 0.45);
  const svg = profileChartSvg({
    ...chartInputFor(check.inputs, check.results, profile),
    width,
    height: chartHeight,
    fontFamily: 'Merriweather',
  });
  if (doc.y + chartHeight > doc.page.height - doc.page.margins.bottom) doc.addPage();
  SVGtoPDF(doc, svg, doc.page.margins.left, doc.y, { assumePt: true, fontCallback: chartFont });
  doc.y += chartHeight + 8;

  heading(doc, 'Findings');
  const findings = report.findings;
  drawTable(
    doc,
    [
      { title: 'Rule', width: 190 },
      { title: 'Station', width: 50 },
      { title: 'Measured', width: 65, align: 'right' },
      { title: 'Limit', width: 65, align: 'right' },
      { title: 'Room to spare', width: 65, align: 'right' },
      { title: 'Result', width: 81 },
    ],
    findings.map((f) => findingCells(f, formatStation, profile.units)),
    { highlight: (i) => findings[i].status === 'fail' },
  );

  designSections(doc, check);
  apronSection(doc, check);

  heading(doc, `Rule profile: ${data.jurisdiction.name}, version ${data.version.version}`);
  drawTable(
    doc,
    [
      { title: 'Value', width: 170 },
      { title: 'Setting', width: 80 },
      { title: 'Source', width: 266 },
    ],
    profileValueRows(profile),
  );

  heading(doc, 'Cautions');
  for (const caution of reportCautions) paragraph(doc, `• ${caution}`);
  doc.end();
  return done;
}
