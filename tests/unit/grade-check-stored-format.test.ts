import { describe, expect, it } from 'vitest';
import { defaultHaul } from '@shared/charts/cut-fill-table';
import { GRADE_CHECK_FORMAT_VERSION, gradeCheckInputsSchema } from '@shared/contracts/grade-checks';
import { checkEntrance, commonRuralTemplate, laserSetup } from '@shared/engine';
import {
  readGradeCheckRecord,
  readGradeCheckRecordOrNull,
  StoredGradeCheckError,
  toStoredColumns,
} from '@shared/grade-check/stored-check';

const ground = [
  { stationFt: 0, elevationFt: 100 },
  { stationFt: 20, elevationFt: 100.6 },
  { stationFt: 60, elevationFt: 104 },
];
const laser = {
  originElevationFt: 100,
  roadGradePercent: 1,
  landingGradePercent: 3,
  landingLengthFt: 20,
  drivewayGradePercent: 8.5,
  receiverOffsetFt: 6,
  stakes: [{ label: 'CL 0+40', offsetFt: 0, distanceFt: 40, rodReadingFt: 5.4 }],
};
const report = checkEntrance({ profile: ground, roadEdgeStationFt: 0 }, commonRuralTemplate);

/** A row as the check screen saved it before the format version: no `applied`, no haul, a bare list of points. */
const formatOneRow = () => ({
  formatVersion: 1,
  inputs: {
    profile: ground,
    roadEdgeStationFt: 0,
    laser: { ...laser, drivewayCrossSlopePercent: 0 },
    design: { existing: ground, roadEdgeElevationFt: 100 },
  },
  results: { report, laser: laserSetup(laser) },
});

describe('a stored grade check read through the contract', () => {
  it('upgrades a format 1 row: defaults filled, the phantom driveway cross slope dropped, the results kept as recorded', () => {
    const record = readGradeCheckRecord(formatOneRow());
    expect(record.formatVersion).toBe(GRADE_CHECK_FORMAT_VERSION);
    expect(record.inputs.design).toMatchObject({ applied: false, haul: defaultHaul, roadEdgeElevationFt: 100 });
    expect(record.inputs.laser).not.toHaveProperty('drivewayCrossSlopePercent');
    expect(record.inputs.scrapeStepFt).toBeGreaterThan(0);
    expect(record.inputs.profile).toEqual(ground);
    expect(record.results).toEqual(formatOneRow().results);
  });

  it('reads a current row as written, a cross slope that comes with a warp length included', () => {
    const inputs = gradeCheckInputsSchema.parse({
      profile: ground,
      roadEdgeStationFt: 0,
      laser: { ...laser, drivewayCrossSlopePercent: 1, warpLengthFt: 15 },
    });
    const record = readGradeCheckRecord(toStoredColumns(inputs, { report }));
    expect(record.inputs).toEqual(inputs);
    expect(record.results).toEqual({ report });
  });

  it('refuses a row it cannot read: no engine report, a format newer than this program, inputs of no known shape', () => {
    expect(() => readGradeCheckRecord({ formatVersion: 1, inputs: {}, results: {} })).toThrow(StoredGradeCheckError);
    expect(readGradeCheckRecordOrNull({ formatVersion: 1, inputs: {}, results: {} })).toBeNull();
    expect(() => readGradeCheckRecord({ ...formatOneRow(), formatVersion: GRADE_CHECK_FORMAT_VERSION + 1 })).toThrow(
      /newer/,
    );
    expect(() => readGradeCheckRecord({ ...formatOneRow(), inputs: { profile: 'flat' } })).toThrow(/inputs\.profile/);
  });
});
