import { formatStation } from '@shared/engine';
import { headwaterWords } from '@shared/charts/check-words';
import { haulEstimate, loadsText } from '@shared/charts/cut-fill-table';
import type { GradeCheck } from '../grade-checks/grade-checks.service';
import { drawTable, heading, paragraph } from './pdf-table';
import { valueText } from './report-words';

const ft = (v: number) => `${v.toFixed(2)} ft`;
const maybe = (v: number | undefined, unit: string) => (v === undefined ? '-' : valueText(v, unit));

/** Cut/fill, culvert, sight distance and laser sections: each appears only when the check has that part. */
export function designSections(doc: PDFKit.PDFDocument, check: GradeCheck) {
  const { results, inputs } = check;
  const proposal = results.proposal;
  if (proposal) {
    heading(
      doc,
      inputs.design?.applied ? 'Proposed profile (applied): cut and fill' : 'Least-earth proposal: cut and fill',
    );
    if (!proposal.feasible)
      paragraph(doc, `No compliant profile was found: ${proposal.reason ?? 'the limits cannot all be met'}.`);
    else {
      drawTable(
        doc,
        [
          { title: 'Station', width: 80 },
          { title: 'Ground', width: 100, align: 'right' },
          { title: 'Design', width: 100, align: 'right' },
          { title: 'Cut (+) / fill (-)', width: 110, align: 'right' },
        ],
        proposal.cutFillByStation.map((r) => [
          formatStation(r.stationFt),
          ft(r.existingFt),
          ft(r.designFt),
          ft(r.cutFillFt),
        ]),
      );
      const haul = haulEstimate(proposal, inputs.design?.haul);
      paragraph(
        doc,
        `Cut ${haul.cutCuYd.toFixed(1)} cu yd (bank): ${loadsText(haul.cutLoads, haul.truckCuYd)} to haul away. Fill ${haul.fillCuYd.toFixed(1)} cu yd (compacted): ${loadsText(haul.fillLoads, haul.truckCuYd)} to bring in. Swell and shrink factors for ${haul.soil}.`,
      );
    }
  }
  const culvert = results.report.culvert;
  if (culvert) {
    heading(doc, 'Culvert');
    paragraph(
      doc,
      [
        `Length needed ${maybe(culvert.requiredLengthFt, 'ft')}`,
        `cover ${maybe(culvert.coverIn, 'in')}`,
        `slope ${maybe(culvert.slopeFtPerFt, 'ft/ft')}`,
        `full-flow capacity ${maybe(culvert.capacityCfs, 'cfs')} for a design flow of ${maybe(culvert.designFlowCfs, 'cfs')}`,
        `headwater ${maybe(culvert.headwaterFt, 'ft')} (HW/D ${maybe(culvert.hwOverD, 'HW/D').replace(' HW/D', '')})`,
      ].join('; ') + '.',
    );
    const headwater = headwaterWords(culvert);
    if (headwater) paragraph(doc, headwater);
  }
  const sight = results.report.sight;
  if (sight) {
    heading(doc, 'Sight distance');
    const right =
      sight.requiredRightFt === null
        ? 'none to the right (right turns only)'
        : `${sight.requiredRightFt.toFixed(0)} ft to the right`;
    paragraph(
      doc,
      `${sight.basis === 'stopping' ? 'Stopping' : 'Intersection'} sight distance at ${sight.speedMph} mph needs ${sight.requiredLeftFt.toFixed(0)} ft to the left and ${right}; measured ${maybe(inputs.sight?.measuredLeftFt, 'ft')} left and ${maybe(inputs.sight?.measuredRightFt, 'ft')} right.`,
    );
  }
  const laser = results.laser;
  if (laser) {
    heading(doc, 'Laser settings');
    paragraph(
      doc,
      `First setup (landing), origin ${ft(laser.originElevationFt)} at the road edge: ${laser.description} Steepest ${laser.steepestPercent.toFixed(2)}% toward ${laser.steepestBearingDeg.toFixed(0)} deg.`,
    );
    const second = laser.secondSetup;
    if (laser.warp) paragraph(doc, `${laser.warp.description} No laser plane carries it: it is built to the stakes.`);
    paragraph(
      doc,
      `Second setup (driveway), origin ${ft(second.originElevationFt)} at ${formatStation(second.originDistanceFt)}: ${second.description} Steepest ${second.steepestPercent.toFixed(2)}%.`,
    );
    if (laser.stakes.length > 0) {
      drawTable(
        doc,
        [
          { title: 'Stake', width: 120 },
          { title: 'Setup', width: 70 },
          { title: 'Design elevation', width: 110, align: 'right' },
          { title: 'Instruction', width: 120 },
        ],
        laser.stakes.map((s) => [s.label, s.setup, ft(s.designElevationFt), s.instruction]),
      );
    }
  }
}
