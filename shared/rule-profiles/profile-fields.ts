import { inspectionDefault, type RuleProfile } from '../engine/rule-profile';

export interface ProfileField {
  path: string;
  label: string;
  unit?: string;
  optional?: boolean;
  choices?: readonly (readonly [string, string])[];
  text?: boolean;
  /** What a choice reads as when the version has no value (saved before the setting existed). */
  fallback?: string;
  /** Where its source note is kept when one note covers several values (the design vehicle). */
  sourceKey?: string;
}

const vehicle = (path: string, label: string, unit?: string, text?: boolean): ProfileField => ({
  path: `designVehicle.${path}`,
  label,
  unit,
  text,
  sourceKey: 'designVehicle',
});

/** The rule profile form, grouped the way an access permit's standards usually read. */
export const profileGroups: { title: string; fields: ProfileField[] }[] = [
  {
    title: 'Landing and grades',
    fields: [
      { path: 'landing.lengthFt', label: 'Landing length from the road edge', unit: 'ft' },
      { path: 'landing.minGradePercent', label: 'Landing: steepest fall toward the road (negative)', unit: '%' },
      { path: 'landing.maxGradePercent', label: 'Landing: steepest rise away from the road', unit: '%' },
      { path: 'maxGradePercent', label: 'Maximum driveway grade beyond the landing', unit: '%' },
      { path: 'minDrainageGradePercent', label: 'Minimum grade for drainage', unit: '%', optional: true },
    ],
  },
  {
    title: 'Grade breaks and design vehicle',
    fields: [
      { path: 'maxGradeChangePercent', label: 'Maximum grade change at a break', unit: '%' },
      vehicle('name', 'Design vehicle', undefined, true),
      vehicle('wheelbaseFt', 'Wheelbase', 'ft'),
      vehicle('frontOverhangFt', 'Front overhang', 'ft'),
      vehicle('rearOverhangFt', 'Rear overhang', 'ft'),
      vehicle('clearanceIn', 'Ground clearance', 'in'),
    ],
  },
  {
    title: 'Culvert',
    fields: [
      { path: 'culvert.minDiameterIn', label: 'Minimum diameter', unit: 'in', optional: true },
      { path: 'culvert.minCoverIn', label: 'Minimum cover over the pipe', unit: 'in', optional: true },
      { path: 'culvert.minLengthFt', label: 'Minimum length', unit: 'ft', optional: true },
      { path: 'culvert.lengthIncrementFt', label: 'Lengths sold in steps of', unit: 'ft' },
      { path: 'culvert.maxHeadwaterToDiameter', label: 'Maximum headwater to diameter (HW/D)', optional: true },
    ],
  },
  {
    title: 'Sight distance',
    fields: [
      {
        path: 'sight.basis',
        label: 'Sight distance required',
        choices: [
          ['intersection', 'Intersection sight distance'],
          ['stopping', 'Stopping sight distance'],
        ],
      },
      { path: 'sight.designSpeedMph', label: 'Design speed where none is posted', unit: 'mph', optional: true },
      {
        path: 'sight.vehicle',
        label: 'Vehicle pulling out',
        choices: [
          ['passenger', 'Passenger car'],
          ['single-unit', 'Single-unit truck'],
          ['combination', 'Combination truck'],
        ],
      },
      {
        path: 'sight.gradeReading',
        label: 'Extra time for a driveway climbing to the road over 3%',
        choices: [
          ['above-3-percent', 'Per percent above 3% (no jump at 3%)'],
          ['whole-grade', 'Per percent of the whole grade (jumps at 3%)'],
        ],
      },
    ],
  },
  {
    title: 'Geometry',
    fields: [
      { path: 'geometry.minWidthFt', label: 'Narrowest entrance', unit: 'ft', optional: true },
      { path: 'geometry.maxWidthFt', label: 'Widest entrance', unit: 'ft', optional: true },
      { path: 'geometry.minFlareRadiusFt', label: 'Smallest flare or return radius', unit: 'ft', optional: true },
      {
        path: 'geometry.minDistanceToIntersectionFt',
        label: 'Nearest an intersection may be',
        unit: 'ft',
        optional: true,
      },
      {
        path: 'geometry.minDistanceToPropertyLineFt',
        label: 'Nearest the property line may be',
        unit: 'ft',
        optional: true,
      },
      {
        path: 'geometry.warpLengthFt',
        label: 'Warp length, road grade to driveway cross slope',
        unit: 'ft',
        optional: true,
      },
    ],
  },
  {
    title: 'As-built tolerance',
    fields: [
      { path: 'asBuilt.gradeTolerancePercent', label: 'Grade tolerance', unit: '%' },
      { path: 'asBuilt.elevationToleranceFt', label: 'Elevation tolerance', unit: 'ft' },
    ],
  },
  {
    title: 'Inspection',
    fields: [
      {
        path: 'inspection',
        label: 'Road authority inspection of the built entrance',
        choices: [
          ['not-required', 'Not required: the office may close once it is built'],
          ['required', 'Required: the office closes only after a passed inspection'],
        ],
        fallback: inspectionDefault,
      },
    ],
  },
  {
    title: 'Units',
    fields: [
      {
        path: 'units',
        label: 'Show the findings in (the chart, laser and stake values stay in feet, as surveyed)',
        choices: [
          ['us', 'US customary (ft, in)'],
          ['metric', 'Metric (m, mm)'],
        ],
      },
    ],
  },
];

export const allFields = profileGroups.flatMap((g) => g.fields);

export function valueAt(profile: RuleProfile, path: string): unknown {
  return path
    .split('.')
    .reduce<unknown>(
      (v, key) => (v && typeof v === 'object' ? (v as Record<string, unknown>)[key] : undefined),
      profile,
    );
}

export const sourceKeyOf = (f: ProfileField) => f.sourceKey ?? f.path;

/** The form's field at a dotted path of the profile ("landing.maxGradePercent"), if the form has one. */
export const profileFieldAt = (path: string): ProfileField | undefined => allFields.find((f) => f.path === path);

/** A value as a person reads it: a choice by its words ("Passenger car", not "passenger"), a number with its unit. */
export function profileValueText(profile: RuleProfile, field: ProfileField, notSet = 'not set'): string {
  const value = valueAt(profile, field.path);
  if (value === undefined || value === null || value === '') return notSet;
  const choice = field.choices?.find(([v]) => v === value);
  if (choice) return choice[1];
  return field.unit ? `${String(value)}${field.unit === '%' ? '%' : ` ${field.unit}`}` : String(value);
}
