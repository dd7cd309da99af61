import { z } from 'zod';
import {
  GRADE_CHECK_FORMAT_VERSION,
  storedGradeCheckInputsSchema,
  type GradeCheckInputs,
  type GradeCheckRecord,
  type GradeCheckResults,
} from '../contracts/grade-checks';

/**
 * How a saved check sits in its columns: the format version, and the inputs and results as jsonb. Rows saved before
 * the version column existed read as format 1.
 *
 * Format 1 (rows saved before the version): inputs as the screen sent them at the time, parsed or not (a bare array
 * of points for a profile, no haul choice, no `applied` flag), and a laser input that may carry the old default
 * driveway cross slope of 0 without a warp length, which no screen ever let anyone choose.
 * Format 2: inputs exactly as gradeCheckInputsSchema outputs them, results exactly as runGradeCheck returns them.
 */
export interface StoredGradeCheckColumns {
  formatVersion: number;
  inputs: unknown;
  results: unknown;
}

const pointSchema = z.object({ stationFt: z.number(), elevationFt: z.number() });
// The record's results are the engine's own output; only what every reader leans on is checked here.
const reportSchema = z
  .object({
    passes: z.boolean(),
    profile: z.object({ points: z.array(pointSchema).min(2) }).loose(),
    findings: z.array(z.object({ ruleId: z.string(), status: z.string() }).loose()),
  })
  .loose();
const resultsSchema = z.object({ report: reportSchema }).loose();

export class StoredGradeCheckError extends Error {
  constructor(reason: string) {
    super(`The stored grade check cannot be read: ${reason}`);
    this.name = 'StoredGradeCheckError';
  }
}

function parseInputs(raw: unknown): GradeCheckInputs {
  const parsed = storedGradeCheckInputsSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const [issue] = parsed.error.issues;
  throw new StoredGradeCheckError(`inputs.${issue?.path.join('.') ?? ''} ${issue?.message ?? ''}`);
}

/** Format 1 to 2: defaults filled by the schema, the phantom cross slope dropped so the driveway keeps the road's tilt. */
function upgradeInputsFrom1(raw: unknown): GradeCheckInputs {
  const inputs = parseInputs(raw);
  if (inputs.laser && inputs.laser.warpLengthFt === undefined && inputs.laser.drivewayCrossSlopePercent !== undefined) {
    const { drivewayCrossSlopePercent: _phantom, ...laser } = inputs.laser;
    return { ...inputs, laser };
  }
  return inputs;
}

/** A saved check read as the current format, whatever format it was saved in. Throws StoredGradeCheckError. */
export function readGradeCheckRecord(stored: StoredGradeCheckColumns): GradeCheckRecord {
  const { formatVersion } = stored;
  if (formatVersion > GRADE_CHECK_FORMAT_VERSION)
    throw new StoredGradeCheckError(`format ${formatVersion} is newer than this program reads`);
  if (!resultsSchema.safeParse(stored.results).success)
    throw new StoredGradeCheckError('no engine report in its results');
  const inputs = formatVersion < 2 ? upgradeInputsFrom1(stored.inputs) : parseInputs(stored.inputs);
  // The parse above only vouches for the shape; the record's own results are handed on untouched.
  return { formatVersion: GRADE_CHECK_FORMAT_VERSION, inputs, results: stored.results as GradeCheckResults };
}

/** The same, or null for a row no reader can use (a check saved without a report). */
export function readGradeCheckRecordOrNull(stored: StoredGradeCheckColumns): GradeCheckRecord | null {
  try {
    return readGradeCheckRecord(stored);
  } catch (error) {
    if (error instanceof StoredGradeCheckError) return null;
    throw error;
  }
}

/** The columns to write for a check in the current format: the results exactly as runGradeCheck returned them. */
export function toStoredColumns(inputs: GradeCheckInputs, results: GradeCheckResults) {
  return { formatVersion: GRADE_CHECK_FORMAT_VERSION, inputs, results };
}
