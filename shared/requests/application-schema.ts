import { z } from 'zod';
import {
  drainageKinds,
  entranceUses,
  entranceWorks,
  positionKinds,
  roadOwners,
  timings,
  vehicleKinds,
} from './choices';

/**
 * The one application schema, used by the wizard in the browser and by the server. Each step has a base shape
 * (types and bounds only, so a half-filled draft can be saved) and a complete form that also says what is
 * missing. Messages are written to sit next to the field.
 */
const required = (what: string) => (iss: { input: unknown }) => (iss.input === undefined ? 'This is required.' : what);
// Optional answers default to empty, so an older draft that never saw a field still completes.
const text = (max: number, tooLong: string) =>
  z
    .string({ error: required('Must be text.') })
    .trim()
    .max(max, tooLong)
    .default('');
const optionalNumber = (min: number, max: number, outOfRange: string) =>
  z.number({ error: 'Must be a number.' }).min(min, outOfRange).max(max, outOfRange).nullable().default(null);

export const siteStepShape = z.object({
  address: text(200, 'Keep the address under 200 characters.'),
  parcelNumber: text(40, 'A parcel number is at most 40 characters.'),
  roadName: text(120, 'Keep the road name under 120 characters.'),
  roadOwner: z.enum(roadOwners, { error: 'Choose who owns the road, or “Not sure”.' }),
  postedSpeedMph: z
    .number({ error: 'Must be a number.' })
    .int('Use a whole number of mph.')
    .min(5, 'Posted speeds are between 5 and 75 mph.')
    .max(75, 'Posted speeds are between 5 and 75 mph.')
    .nullable()
    .default(null),
  positionKind: z.enum(positionKinds, { error: 'Choose how to say where the entrance goes.' }),
  landmark: text(120, 'Keep the landmark under 120 characters.'),
  distanceFromLandmarkFt: optionalNumber(0, 26400, 'Give a distance between 0 and 26,400 ft (5 miles).'),
  siteLat: optionalNumber(-90, 90, 'Latitude is between -90 and 90.'),
  siteLng: optionalNumber(-180, 180, 'Longitude is between -180 and 180.'),
  /** The owner said no to using a photo's position, so it is not offered again. */
  photoPositionDeclined: z.boolean({ error: 'Must be yes or no.' }).optional(),
});

export const entranceStepShape = z.object({
  work: z.enum(entranceWorks, { error: 'Choose a new entrance or widening an existing one.' }),
  use: z.enum(entranceUses, { error: 'Choose what the entrance will serve.' }),
  vehicles: z
    .array(z.enum(vehicleKinds, { error: 'Choose from the listed vehicles.' }), {
      error: required('Choose the vehicles.'),
    })
    .max(vehicleKinds.length, 'Choose each vehicle once.')
    .refine((v) => new Set(v).size === v.length, 'Choose each vehicle once.'),
  drivewayLengthFt: optionalNumber(1, 5280, 'Give a length between 1 and 5,280 ft.'),
  riseToHouseFt: optionalNumber(
    -300,
    300,
    'Give a rise between -300 and 300 ft (negative if the house sits below the road).',
  ),
  existingDrainage: z.enum(drainageKinds, { error: 'Say whether there is a ditch or culvert, or “Not sure”.' }),
  timing: z.enum(timings, { error: 'Choose when you would like the work done.' }),
  notes: text(2000, 'Keep notes under 2,000 characters.'),
});

const filled = (min: number, max: number, missing: string, tooLong: string) =>
  z
    .string({ error: required('Must be text.') })
    .trim()
    .min(min, missing)
    .max(max, tooLong);

// Conditional answers: they only run once the step's types are right, which is when the form can show them.
export const siteStepSchema = siteStepShape
  .extend({
    address: filled(5, 200, 'Enter the street address of the property.', 'Keep the address under 200 characters.'),
    roadName: filled(
      2,
      120,
      'Enter the name of the road the entrance joins.',
      'Keep the road name under 120 characters.',
    ),
  })
  .superRefine((v, ctx) => {
    const need = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (v.positionKind === 'landmark') {
      if (v.landmark.length < 2) need('landmark', 'Name a landmark, e.g. a mailbox, a crossroad or a barn.');
      if (v.distanceFromLandmarkFt === null)
        need('distanceFromLandmarkFt', 'Give the distance from the landmark in feet.');
    } else {
      if (v.siteLat === null) need('siteLat', 'Enter the latitude, or use a photo’s position.');
      if (v.siteLng === null) need('siteLng', 'Enter the longitude, or use a photo’s position.');
    }
  });

export const entranceStepSchema = entranceStepShape.extend({
  vehicles: entranceStepShape.shape.vehicles.refine((v) => v.length > 0, 'Tick at least one kind of vehicle.'),
});

/** What a draft may hold: every field typed and bounded, none required yet. */
export const applicationDraftSchema = z.object({
  site: siteStepShape.partial().optional(),
  entrance: entranceStepShape.partial().optional(),
});

/** A complete application, as it must be before it goes to the office. */
export const submittedApplicationSchema = z.object(
  {
    site: siteStepSchema,
    entrance: entranceStepSchema,
  },
  { error: 'Fill in both steps of the form.' },
);

export type SiteStep = z.infer<typeof siteStepShape>;
export type EntranceStep = z.infer<typeof entranceStepShape>;
export type ApplicationDraft = z.infer<typeof applicationDraftSchema>;
export type SubmittedApplication = z.infer<typeof submittedApplicationSchema>;
