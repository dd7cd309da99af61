import {
  apronWarpLength,
  elevationAt,
  normalizeProfile,
  type LaserSetupInput,
  type ProfileInput,
  type RuleProfile,
} from '@shared/engine';

/**
 * The laser plane follows the profile being built: its origin at the road edge, the landing axis at the landing's
 * overall grade, the second setup at the driveway's overall grade from the landing's end to the last station.
 */
export function laserFromProfile(
  profile: ProfileInput,
  roadEdgeStationFt: number,
  rules: RuleProfile,
  crew: {
    roadGradePercent: number;
    receiverOffsetFt: number;
    stakes: LaserSetupInput['stakes'];
    drivewayCrossSlopePercent?: number;
    warpLengthFt?: number;
  },
): LaserSetupInput | undefined {
  let points;
  try {
    points = normalizeProfile(profile);
  } catch {
    // The check reports the profile's problem itself; without a usable profile there is no plane to set.
    return undefined;
  }
  const last = points[points.length - 1].stationFt;
  const landingEnd = Math.min(roadEdgeStationFt + rules.landing.lengthFt, last);
  const origin = elevationAt(points, roadEdgeStationFt);
  const atLandingEnd = elevationAt(points, landingEnd);
  const round = (v: number) => Math.round(v * 100) / 100;
  const landingGradePercent =
    landingEnd > roadEdgeStationFt ? round(((atLandingEnd - origin) / (landingEnd - roadEdgeStationFt)) * 100) : 0;
  const drivewayGradePercent =
    last > landingEnd
      ? round(((points[points.length - 1].elevationFt - atLandingEnd) / (last - landingEnd)) * 100)
      : landingGradePercent;
  return {
    originElevationFt: round(origin),
    roadGradePercent: crew.roadGradePercent,
    landingGradePercent,
    landingLengthFt: landingEnd - roadEdgeStationFt,
    drivewayGradePercent,
    receiverOffsetFt: crew.receiverOffsetFt,
    stakes: crew.stakes,
    // With a warped apron the driveway setup takes the cross slope the warp ends on, over the apron's own warp.
    ...(crew.drivewayCrossSlopePercent === undefined
      ? {}
      : {
          drivewayCrossSlopePercent: crew.drivewayCrossSlopePercent,
          warpLengthFt: apronWarpLength(crew.warpLengthFt, rules).warpLengthFt,
        }),
  };
}
