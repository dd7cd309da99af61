import { formatStation, type ApronSummary, type CulvertSummary } from '../engine';

const pct = (v: number) => `${(Math.round(v * 100) / 100).toString()}%`;
const ft = (v: number) => `${v.toFixed(2)} ft`;
const across = (v: number) =>
  v === 0 ? 'level across' : `${pct(Math.abs(v))} ${v > 0 ? 'rising' : 'falling'} to the right`;

/** The warp in one sentence: from what, to what, over how long, with the edges where. Screen, report and field sheet alike. */
export function warpWords(apron: ApronSummary): string {
  const from =
    apron.warpLengthFrom === 'input'
      ? 'as entered'
      : apron.warpLengthFrom === 'rule profile'
        ? "the rule profile's"
        : 'the landing length';
  return (
    `Facing into the property, the landing is ${across(apron.roadGradePercent)}, as the road is; from ` +
    `${formatStation(apron.warpStartStationFt)}, where the landing ends, the apron turns to the driveway's cross slope ` +
    `(${across(apron.drivewayCrossSlopePercent)}) over ${apron.warpLengthFt} ft (${from}); its edges run ${apron.halfWidthFt} ft either side of the centreline.`
  );
}

export const warpStakeColumns = [
  'Station',
  'Cross slope',
  'Left offset',
  'Left elevation',
  'Centreline',
  'Right offset',
  'Right elevation',
] as const;

/** One row per warp stake, in the order of warpStakeColumns; offsets are - to the left, + to the right facing in. */
export function warpStakeRows(apron: ApronSummary): string[][] {
  return apron.stakes.map((s) => [
    formatStation(s.stationFt),
    pct(s.crossSlopePercent),
    `${Math.abs(s.leftOffsetFt)} ft left`,
    ft(s.leftElevationFt),
    ft(s.centreElevationFt),
    `${s.rightOffsetFt} ft right`,
    ft(s.rightElevationFt),
  ]);
}

/** Which control sets the culvert's headwater, in words; null when the check had no flow to work it out. */
export function headwaterWords(c: CulvertSummary): string | null {
  if (c.headwaterFt === undefined || c.hwOverD === undefined) return null;
  const both =
    c.outletHeadwaterFt === undefined
      ? `inlet control ${ft(c.inletHeadwaterFt ?? c.headwaterFt)}; outlet control not worked out without the pipe length`
      : `inlet control ${ft(c.inletHeadwaterFt ?? c.headwaterFt)}, outlet control ${ft(c.outletHeadwaterFt)}`;
  return `Headwater ${ft(c.headwaterFt)} above the inlet invert (HW/D ${c.hwOverD.toFixed(2)}): ${c.control ?? 'inlet'} control governs (${both}).`;
}
