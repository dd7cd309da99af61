import { z } from 'zod';
import {
  checkEntranceInputSchema,
  laserSetupInputSchema,
  proposeProfileInputSchema,
  type EntranceReport,
  type laserSetup,
  type ProposedProfile,
} from '../engine';
import { defaultHaul } from '../charts/cut-fill-table';
import type { RequestStatus } from '../workflow/statuses';
import type { Moment } from './wire';

/** What the office measured about the road itself; the laser's road axis and the report's site notes come from it. */
export const roadPartSchema = z.object({
  // Signed: + rises to the right for someone standing on the road edge facing into the property.
  gradePercent: z.number().min(-25).max(25),
  edgeElevationFt: z.number().min(-2_000).max(30_000),
  // Checks saved before the road side was an input kept the cross slope here, as a note only.
  crossSlopePercent: z.number().min(-15).max(15).optional(),
});

/**
 * The design side of a check: the surveyed ground the least-earth proposal starts from, and whether the
 * profile being checked is that proposal (applied) rather than the ground as found.
 */
export const designPartSchema = proposeProfileInputSchema.extend({
  applied: z.boolean().default(false),
  haul: z
    .object({ soil: z.enum(['loam', 'clay', 'sand']), truckCuYd: z.number().positive().max(40) })
    .default(defaultHaul),
});

export const culvertMaterials = ['concrete', 'corrugated metal', 'corrugated plastic', 'PVC'] as const;
const side = z.enum(['left', 'right'], { error: 'must be left or right (facing into the property)' });

/**
 * What only the plan view and the permit packet read: nothing here changes a finding. All optional, so checks saved
 * before it existed read as they were (no format change: an absent part is what they always had).
 */
export const sitePlanPartSchema = z.object({
  // From the road edge to the right-of-way line, measured along the driveway.
  rightOfWayFt: z
    .number('must be a number of feet')
    .min(0, 'must be 0 ft or more')
    .max(500, 'must be at most 500 ft')
    .optional(),
  roadWidthFt: z
    .number('must be a number of feet')
    .min(8, 'must be at least 8 ft')
    .max(200, 'must be at most 200 ft')
    .optional(),
  // The direction the driveway runs into the property, degrees clockwise from north.
  bearingDeg: z
    .number('must be a number of degrees')
    .min(0, 'must be 0 to 359.9 degrees')
    .lt(360, 'must be 0 to 359.9 degrees')
    .optional(),
  intersectionSide: side.optional(),
  intersectionName: z.string().trim().min(1, 'must not be blank').max(80, 'must be at most 80 characters').optional(),
  propertyLineSide: side.optional(),
  culvertStationFt: z.number('must be a station in feet').min(-10_000).max(100_000).optional(),
  culvertMaterial: z.enum(culvertMaterials, { error: `must be one of: ${culvertMaterials.join(', ')}` }).optional(),
});
export type SitePlanPart = z.output<typeof sitePlanPartSchema>;

/** Exactly what checkEntrance takes, plus the road, the laser setup input, the design part and the plan's extras. */
export const storedGradeCheckInputsSchema = checkEntranceInputSchema.extend({
  road: roadPartSchema.optional(),
  plan: sitePlanPartSchema.optional(),
  laser: laserSetupInputSchema.optional(),
  design: designPartSchema.optional(),
});

const MAX_SHOTS = 500;
const MAX_SCRAPE_STEPS = 50_000;
type Profile = z.output<typeof checkEntranceInputSchema>['profile'];

function shotCount(profile: Profile): number {
  if (Array.isArray(profile)) return profile.length;
  if (profile.kind === 'elevations') return profile.points.length;
  if (profile.kind === 'rod-readings') return profile.readings.length;
  return profile.segments.length + 1;
}

function spanFt(profile: Profile): number {
  if (!Array.isArray(profile) && profile.kind === 'segment-grades')
    return profile.segments.reduce((sum, seg) => sum + seg.lengthFt, 0);
  const stations = (
    Array.isArray(profile) ? profile : profile.kind === 'elevations' ? profile.points : profile.readings
  ).map((p) => p.stationFt);
  return Math.max(...stations) - Math.min(...stations);
}

/**
 * A check's inputs as the form sends them. The parsed form is what gets stored, so a re-run reads the same values
 * the first run did. Issue paths are the form's own field names ("profile.points.1.stationFt").
 */
export const gradeCheckInputsSchema = storedGradeCheckInputsSchema.superRefine((inputs, ctx) => {
  // The engine accepts survey-sized and far larger profiles; a saved check is run inside a web request, so it is
  // held to what a driveway survey needs and the least-earth solve stays well under a second.
  for (const [path, profile] of [
    [['profile'], inputs.profile],
    [['design', 'existing'], inputs.design?.existing],
  ] as const) {
    if (profile && shotCount(profile) > MAX_SHOTS)
      ctx.addIssue({ code: 'custom', path: [...path], message: `a grade check takes at most ${MAX_SHOTS} shots` });
  }
  const steps = spanFt(inputs.profile) / inputs.scrapeStepFt;
  if (steps > MAX_SCRAPE_STEPS)
    ctx.addIssue({
      code: 'custom',
      path: ['scrapeStepFt'],
      message: `too fine for a profile this long: use at least ${Math.ceil((spanFt(inputs.profile) / MAX_SCRAPE_STEPS) * 100) / 100} ft`,
    });
});
/** What the form builds and sends (defaults not yet filled). */
export type GradeCheckInputsInput = z.input<typeof gradeCheckInputsSchema>;
/** What is stored and what every run reads. */
export type GradeCheckInputs = z.output<typeof gradeCheckInputsSchema>;

export interface GradeCheckResults {
  report: EntranceReport;
  laser?: ReturnType<typeof laserSetup>;
  proposal?: ProposedProfile;
  /** When a proposal was applied: the ground as surveyed, checked against the same rules, for comparison. */
  surveyed?: EntranceReport;
}

/** The shape of the stored inputs and results; a reader upgrades older rows to it (shared/grade-check/stored-check.ts). */
export const GRADE_CHECK_FORMAT_VERSION = 2;

/** A saved check's inputs and results, read and upgraded to the current format. */
export interface GradeCheckRecord {
  formatVersion: typeof GRADE_CHECK_FORMAT_VERSION;
  inputs: GradeCheckInputs;
  results: GradeCheckResults;
}

/**
 * POST /api/requests/:id/grade-checks. A 400 names the inputs' fields by the form's own paths ("culvert.diameterIn"),
 * the body's other fields by their own names ("ruleProfileVersionId", "inputs" when missing, "results").
 */
export const saveGradeCheckInputSchema = z.object({
  ruleProfileVersionId: z.uuid('must be a rule profile version id'),
  // Parsed by gradeCheckInputsSchema in the service, which names the exact field that is wrong.
  inputs: z.unknown().refine((v) => v !== undefined, { message: 'is required' }),
  results: z.undefined({ error: 'is computed by the server; send only the inputs' }).optional(),
});
export type SaveGradeCheckInput = { ruleProfileVersionId: string; inputs: GradeCheckInputsInput };

export const attachGradeCheckInputSchema = z.strictObject({
  shareWithApplicant: z.boolean('must be true or false').default(false),
  /** The office's yes to attaching a check that does not meet the rules. */
  confirmFailing: z.boolean('must be true or false').default(false),
});
export type AttachGradeCheckInput = z.input<typeof attachGradeCheckInputSchema>;

/** One saved check as the API returns it. Dates travel as ISO strings. */
export interface GradeCheckView extends GradeCheckRecord {
  id: string;
  requestId: string;
  number: number;
  ruleProfileVersionId: string;
  engineVersion: string;
  passed: boolean;
  summary: string;
  attachedAt: string | null;
  createdAt: string;
  /** The office only: who saved it. */
  createdById?: string;
}

/** What the check screens need to know about the request, without the applicant's whole application. */
export interface GradeCheckRequestHeader {
  id: string;
  reference: string;
  status: RequestStatus;
  version: number;
  applicantName: string;
  siteAddress: string;
  roadName: string;
  jurisdictionId: string | null;
  application: { site?: { postedSpeedMph?: number | null } };
}

export interface GradeCheckListView {
  request: GradeCheckRequestHeader;
  checks: GradeCheckView[];
}
export interface GradeCheckSavedView {
  check: GradeCheckView;
}
export interface GradeCheckAttachedView {
  check: GradeCheckView;
  documentId: string;
}

/** The longest survey draft kept, in characters of JSON: far more than any real survey, small enough for a row. */
export const maxGradeCheckDraftChars = 200_000;

/**
 * PUT /api/requests/:id/grade-check-draft: the survey form as typed (its own text, checked by the form when read
 * back), kept per request and person until a check is saved from it.
 */
export const saveGradeCheckDraftInputSchema = z.strictObject({
  survey: z
    .record(z.string(), z.unknown(), 'must be the survey form')
    .refine((v) => JSON.stringify(v).length <= maxGradeCheckDraftChars, {
      message: `is too long to keep as a draft (the limit is ${maxGradeCheckDraftChars.toLocaleString('en-US')} characters)`,
    }),
  ruleProfileVersionId: z.uuid('must be a rule profile version id').nullable().default(null),
});
export type SaveGradeCheckDraftInput = z.input<typeof saveGradeCheckDraftInputSchema>;

export interface GradeCheckDraftView<M extends Moment = string> {
  survey: Record<string, unknown>;
  ruleProfileVersionId: string | null;
  updatedAt: M;
}
/** GET and PUT answer the caller's own draft; `null` when there is none. */
export interface GradeCheckDraftAnswer<M extends Moment = string> {
  draft: GradeCheckDraftView<M> | null;
}
