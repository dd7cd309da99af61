import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { formatStation, type RuleProfile } from '@shared/engine';
import { chartInputFor } from '@shared/charts/chart-input';
import { headwaterWords } from '@shared/charts/check-words';
import { materialOf, planInputFor } from '@shared/charts/plan-input';
import { planViewSvg } from '@shared/charts/plan-view';
import { profileChartSvg } from '@shared/charts/profile-chart';
import { formatDay } from '@shared/format/dates';
import type { GradeCheck } from '../grade-checks/grade-checks.service';
import { siteWords } from './grade-check-report';
import { chartFont, registerReportFonts, reportFonts } from './pdf-fonts';
import { drawTable, heading, paragraph } from './pdf-table';
import { findingCells, reportCautions, valueText } from './report-words';

import type { PacketPaperSize as PaperSize } from '@shared/workflow/transition-inputs';

const pdfSize: Record<PaperSize, string> = { letter: 'LETTER', a4: 'A4' };

export interface PacketData {
  request: {
    reference: string;
    applicantName: string;
    siteAddress: string;
    roadName: string;
    permitReference: string | null;
    parcelNumber: string;
    roadOwner: string;
    whereText: string;
  };
  check: GradeCheck;
  profile: RuleProfile;
  version: { version: number; publishedAt: Date | null };
  jurisdiction: { name: string; authority: string };
  /** The office sending it. */
  company: string;
  preparedOn: Date;
  paper: PaperSize;
}

/** The packet's own words for the cautions: the report's, said to the authority reading the application. */
export const packetCautions = reportCautions;

const ft = (v: number | undefined | null) => (v === undefined || v === null ? 'not given' : `${v.toFixed(2)} ft`);

/** Culvert detail rows: what it is, where its ends sit, and what the check found about cover, slope and headwater. */
export function culvertRows(check: Pick<GradeCheck, 'inputs' | 'results'>): string[][] | null {
  const c = check.inputs.culvert;
  if (!c) return null;
  const s = check.results.report.culvert ?? {};
  const length =
    c.lengthFt !== undefined
      ? `${c.lengthFt} ft`
      : s.requiredLengthFt !== undefined
        ? `${s.requiredLengthFt} ft (worked out from the top width and side slopes)`
        : 'not given';
  return [
    ['Diameter', `${c.diameterIn} in`],
    ['Material', check.inputs.plan?.culvertMaterial ?? `${materialOf(c.inlet)} (from the inlet type)`],
    ['Inlet', c.inlet.replace(/-/g, ' ').replace(/^cmp/, 'corrugated metal pipe,')],
    ['Length', length],
    ['Inlet invert', ft(c.inletInvertFt)],
    ['Outlet invert', ft(c.outletInvertFt)],
    ['Slope from the inverts', s.slopeFtPerFt === undefined ? 'not worked out' : valueText(s.slopeFtPerFt, 'ft/ft')],
    [
      'Cover over the pipe',
      s.coverIn === undefined ? 'not worked out (no finished surface given)' : valueText(s.coverIn, 'in'),
    ],
    ['Design flow', s.designFlowCfs === undefined ? 'not given' : valueText(s.designFlowCfs, 'cfs')],
    ['Full-flow capacity', s.capacityCfs === undefined ? 'not worked out' : valueText(s.capacityCfs, 'cfs')],
    ['Headwater', headwaterWords(s) ?? 'not worked out (no design flow)'],
  ];
}

/**
 * The permit packet: one PDF the office sends to the road authority with the application. Applicant, parcel and
 * site; the plan view; the design profile with the landing and limits; the culvert detail; the findings in the rule
 * profile's own terms; the cautions. Every drawing is sized from the page, so Letter and A4 both set cleanly.
 */
export function buildPermitPacket(data: PacketData): Promise<Buffer> {
  const { check, profile, request } = data;
  const doc = new PDFDocument({
    size: pdfSize[data.paper],
    margin: 48,
    info: { Title: `Entrance permit packet - ${request.reference}`, Author: data.company },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  registerReportFonts(doc);
  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  const bottom = () => doc.page.height - doc.page.margins.bottom;

  doc.font(reportFonts.bold.name).fontSize(17).fillColor('#0e2a1f').text('Driveway entrance permit application');
  doc
    .font(reportFonts.body.name)
    .fontSize(10)
    .fillColor('#1c1f1d')
    .text(
      `To ${data.jurisdiction.authority} (${data.jurisdiction.name}) · from ${data.company} · ${formatDay(data.preparedOn)}`,
    );
  doc.text(
    `Our reference ${request.reference}${request.permitReference ? ` · application ${request.permitReference}` : ''}`,
  );
  doc.moveDown(0.6);

  heading(doc, 'Applicant, parcel and site');
  drawTable(
    doc,
    [
      { title: 'Item', width: Math.round(width * 0.28) },
      { title: 'Detail', width: Math.round(width * 0.72) },
    ],
    [
      ['Applicant (homeowner)', request.applicantName],
      ['Site address', request.siteAddress],
      ['Parcel number', request.parcelNumber || 'not given'],
      ['Road', `${request.roadName}${request.roadOwner ? ` (${request.roadOwner})` : ''}`],
      ['Where on the road', request.whereText || 'at the site address'],
      ['Work', siteWords(check)],
    ],
  );

  const plan = planInputFor(check.inputs, check.results.report, { roadName: request.roadName });
  const planHeight = Math.round(width * 0.72);
  const planSvg = planViewSvg({ ...plan, width, height: planHeight, fontFamily: 'Merriweather' });
  const drawnHeight = Number(/height="([\d.]+)"/.exec(planSvg)?.[1] ?? planHeight);
  doc.addPage();
  heading(doc, 'Plan view of the entrance');
  SVGtoPDF(doc, planSvg, doc.page.margins.left, doc.y, { assumePt: true, fontCallback: chartFont });
  doc.y += drawnHeight + 6;
  paragraph(
    doc,
    `Drawn from the grade check's measurements (check ${check.number}); left and right are facing into the property. Sight lines run from the driver's position on the centreline; distances beyond the drawing are written, not drawn to scale.`,
    { italic: true },
  );

  const chartHeight = Math.round(width * 0.45);
  if (doc.y + chartHeight + 60 > bottom()) doc.addPage();
  heading(doc, 'Design profile');
  paragraph(
    doc,
    `Landing of ${profile.landing.lengthFt} ft from the road edge at ${profile.landing.minGradePercent}% to ${profile.landing.maxGradePercent}%; at most ${profile.maxGradePercent}% beyond it. Elevations are exaggerated; grades are written on the segments.`,
  );
  const chartSvg = profileChartSvg({
    ...chartInputFor(check.inputs, check.results, profile),
    width,
    height: chartHeight,
    fontFamily: 'Merriweather',
  });
  SVGtoPDF(doc, chartSvg, doc.page.margins.left, doc.y, { assumePt: true, fontCallback: chartFont });
  doc.y += chartHeight + 8;

  const culvert = culvertRows(check);
  heading(doc, 'Culvert');
  if (culvert)
    drawTable(
      doc,
      [
        { title: 'Item', width: Math.round(width * 0.3) },
        { title: 'Detail', width: Math.round(width * 0.7) },
      ],
      culvert,
    );
  else paragraph(doc, 'No culvert is proposed at this entrance.');

  const { report } = check.results;
  heading(doc, `Findings against ${data.jurisdiction.name}, rule profile version ${data.version.version}`);
  paragraph(
    doc,
    `${report.passes ? 'The entrance as designed meets every rule checked.' : `The entrance as designed does not meet ${report.summary.fail} ${report.summary.fail === 1 ? 'rule' : 'rules'}.`} ${report.summary.text} Limits as published by ${data.jurisdiction.authority}${data.version.publishedAt ? ` on ${formatDay(data.version.publishedAt)}` : ''}.`,
  );
  const scaleColumns = (cols: { title: string; width: number; align?: 'left' | 'right' }[]) => {
    const total = cols.reduce((sum, c) => sum + c.width, 0);
    return cols.map((c) => ({ ...c, width: Math.floor((c.width / total) * width) }));
  };
  drawTable(
    doc,
    scaleColumns([
      { title: 'Rule', width: 190 },
      { title: 'Station', width: 50 },
      { title: 'Measured', width: 65, align: 'right' },
      { title: 'Limit', width: 65, align: 'right' },
      { title: 'Room to spare', width: 65, align: 'right' },
      { title: 'Result', width: 81 },
    ]),
    report.findings.map((f) => findingCells(f, formatStation, profile.units)),
    { highlight: (i) => report.findings[i].status === 'fail' },
  );

  heading(doc, 'Cautions');
  for (const caution of packetCautions) paragraph(doc, `• ${caution}`);
  doc.end();
  return done;
}
