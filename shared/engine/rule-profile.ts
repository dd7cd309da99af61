import { z } from 'zod';
import { bounded, nonNegative, positive } from './numbers';
import { approachGradeReadings } from './sight-distance';

export const designVehicleSchema = z.object({
  name: z.string().min(1).max(80).default('Passenger car'),
  wheelbaseFt: bounded(3, 60),
  frontOverhangFt: nonNegative(20),
  rearOverhangFt: nonNegative(20),
  clearanceIn: bounded(1, 36),
});
export type DesignVehicle = z.output<typeof designVehicleSchema>;

/**
 * US figures for the passenger-car design vehicle. Wheelbase and overhangs are from memory (the Green Book's
 * metric P vehicle is 3.4 m / 0.9 m / 1.5 m); the 5 in clearance is the low-clearance vehicle used in
 * grade-change studies (Eck and Kang, TRR 1356).
 */
export const passengerCarPreset: DesignVehicle = {
  name: 'Passenger car',
  wheelbaseFt: 11,
  frontOverhangFt: 3,
  rearOverhangFt: 5,
  clearanceIn: 5,
};

const landingSchema = z
  .object({
    lengthFt: nonNegative(500),
    // Signed: + rises away from the road. A range such as -4..4 lets the landing fall or rise a little.
    minGradePercent: bounded(-50, 50),
    maxGradePercent: bounded(-50, 50),
  })
  .refine((l) => l.minGradePercent <= l.maxGradePercent, {
    message: 'landing minimum grade must not exceed its maximum',
    path: ['minGradePercent'],
  });

const culvertRulesSchema = z.object({
  minDiameterIn: positive(120).optional(),
  minCoverIn: nonNegative(120).optional(),
  minLengthFt: nonNegative(500).optional(),
  lengthIncrementFt: positive(50).default(2),
  maxHeadwaterToDiameter: positive(10).optional(),
});

const sightRulesSchema = z.object({
  basis: z.enum(['stopping', 'intersection']).default('intersection'),
  // Used when the site input gives no speed for the road.
  designSpeedMph: bounded(10, 90).optional(),
  vehicle: z.enum(['passenger', 'single-unit', 'combination']).default('passenger'),
  gradeReading: z.enum(approachGradeReadings).default('above-3-percent'),
});

const geometryRulesSchema = z.object({
  minWidthFt: nonNegative(200).optional(),
  maxWidthFt: nonNegative(200).optional(),
  minFlareRadiusFt: nonNegative(200).optional(),
  minDistanceToIntersectionFt: nonNegative(5_000).optional(),
  minDistanceToPropertyLineFt: nonNegative(1_000).optional(),
  // Length over which the apron turns from the road's grade to the driveway's cross slope.
  warpLengthFt: positive(500).optional(),
});

// No allowance unless the road authority states one: a default tolerance would be a number nobody published.
const asBuiltRulesSchema = z.object({
  gradeTolerancePercent: nonNegative(10).default(0),
  elevationToleranceFt: nonNegative(2).default(0),
});

export const inspectionSettings = ['not-required', 'required'] as const;
export type InspectionSetting = (typeof inspectionSettings)[number];
/** A profile that says nothing about inspection lets the office close without one, as before the setting existed. */
export const inspectionDefault: InspectionSetting = 'not-required';
export const inspectionRequired = (profile: { inspection?: InspectionSetting }) =>
  (profile.inspection ?? inspectionDefault) === 'required';

/**
 * A road authority's limits as data. Optional limits the authority does not set leave their check
 * "not-checked". `sources` maps a field's dotted path (e.g. "landing.maxGradePercent") to a free-text
 * note saying where the value comes from, so a form can show one source box beside each value.
 */
export const ruleProfileSchema = z.object({
  id: z.string().max(120).optional(),
  jurisdictionName: z.string().max(200).optional(),
  version: z.union([z.string().max(60), z.number().int().nonnegative()]).optional(),
  name: z.string().max(200).optional(),
  units: z.enum(['us', 'metric']).default('us'),
  landing: landingSchema,
  maxGradePercent: positive(50),
  minDrainageGradePercent: positive(10).optional(),
  maxGradeChangePercent: positive(50),
  designVehicle: designVehicleSchema.default(passengerCarPreset),
  culvert: culvertRulesSchema.default({ lengthIncrementFt: 2 }),
  sight: sightRulesSchema.default({ basis: 'intersection', vehicle: 'passenger', gradeReading: 'above-3-percent' }),
  geometry: geometryRulesSchema.default({}),
  asBuilt: asBuiltRulesSchema.default({ gradeTolerancePercent: 0, elevationToleranceFt: 0 }),
  /**
   * Whether the road authority inspects the built entrance before the job may close. Versions saved before the
   * setting existed have none and read as `inspectionDefault`; see `inspectionRequired`.
   */
  inspection: z.enum(inspectionSettings, { error: 'choose whether an inspection is required' }).optional(),
  sources: z.record(z.string(), z.string().max(1_000)).default({}),
});

export type RuleProfileInput = z.input<typeof ruleProfileSchema>;
export type RuleProfile = z.output<typeof ruleProfileSchema>;

const COMMON_PRACTICE = 'common practice (no source)';

/**
 * A starting point for a rural road authority that publishes no numbers of its own: a 4% landing for the
 * first 20 ft and 17% beyond it. Both are common practice with no published source, and labelled so.
 * The grade-change limit of 13% is 17 - 4, so the landing may break straight into the steepest grade; the
 * scrape check then decides whether a car clears that break. No as-built tolerance is assumed.
 */
export const commonRuralTemplate: RuleProfile = {
  id: 'common-rural-template',
  name: 'Common rural template',
  version: 1,
  units: 'us',
  landing: { lengthFt: 20, minGradePercent: -4, maxGradePercent: 4 },
  maxGradePercent: 17,
  maxGradeChangePercent: 13,
  designVehicle: passengerCarPreset,
  culvert: { lengthIncrementFt: 2 },
  sight: { basis: 'intersection', vehicle: 'passenger', gradeReading: 'above-3-percent' },
  geometry: {},
  asBuilt: { gradeTolerancePercent: 0, elevationToleranceFt: 0 },
  sources: {
    'landing.lengthFt': COMMON_PRACTICE,
    'landing.minGradePercent': COMMON_PRACTICE,
    'landing.maxGradePercent': COMMON_PRACTICE,
    maxGradePercent: COMMON_PRACTICE,
    maxGradeChangePercent: '17 - 4: lets the landing break straight into the maximum grade; the scrape check governs',
    'culvert.lengthIncrementFt': `${COMMON_PRACTICE}: pipe is sold in 2 ft steps`,
    'asBuilt.gradeTolerancePercent': "none assumed; enter the road authority's tolerance",
    designVehicle: 'Passenger car: wheelbase and overhangs from memory; 5 in clearance after Eck and Kang, TRR 1356',
  },
};
