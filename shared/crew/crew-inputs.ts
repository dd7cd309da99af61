import { z } from 'zod';
import { fieldLabel } from '../errors/issue-words';
import { dayInput } from '../workflow/dates';
import { expectedVersionSchema, transitionInputs } from '../workflow/transition-inputs';

/**
 * What the crew screens send. Shared so the phone form can mark a bad box before it is sent; the server
 * parses the same schemas, so a hand-made request gets the same 400 with the same field names.
 */
// zod 4 numbers refuse NaN and Infinity already; the message says which number was expected.
const finite = (what: string) => z.number({ error: `must be a number (${what})` });

export { expectedVersionSchema };

// The crew's status changes at their own addresses: the action's shared input without the action, which the address names.
export const acceptJobInputSchema = transitionInputs['accept-job'].omit({ action: true });
export const handBackInputSchema = transitionInputs['hand-back'].omit({ action: true });
export const startWorkInputSchema = transitionInputs['start-work'].omit({ action: true });

export const scheduleJobInputSchema = z.strictObject({
  date: dayInput('pick a day from the calendar').register(fieldLabel, { label: 'Work day' }),
  note: z.string().trim().max(1000, 'must be at most 1000 characters').optional(),
});
export type ScheduleJobInput = z.infer<typeof scheduleJobInputSchema>;

/** One finished-grade shot: a grade from the digital level, or an elevation. Never both. */
export const asBuiltReadingSchema = z
  .strictObject({
    stationFt: finite('station in feet from the road edge')
      .min(-100, 'must be at most 100 ft behind the road edge')
      .max(5000, 'must be within 5000 ft'),
    gradePercent: finite('grade in percent')
      .min(-100, 'must be between -100 and 100')
      .max(100, 'must be between -100 and 100')
      .optional(),
    elevationFt: finite('elevation in feet')
      .min(-2000, 'must be between -2000 and 30000')
      .max(30000, 'must be between -2000 and 30000')
      .optional(),
  })
  .refine((r) => (r.gradePercent === undefined) !== (r.elevationFt === undefined), {
    message: 'give either a grade or an elevation for this station',
    path: ['gradePercent'],
  });
export type AsBuiltReadingInput = z.infer<typeof asBuiltReadingSchema>;

export const saveAsBuiltInputSchema = z.strictObject({
  readings: z
    .array(asBuiltReadingSchema, { error: 'must be a list of readings' })
    .min(1, 'enter at least one reading')
    .max(500, 'at most 500 readings in one set'),
  note: z.string().trim().max(4000, 'must be at most 4000 characters').optional(),
  /** The saved set these readings were edited from; the new set corrects it and the earlier one is kept. */
  replacesSetId: z.uuid('must be the id of a saved set of this job').optional(),
});
export type SaveAsBuiltInput = z.infer<typeof saveAsBuiltInputSchema>;

export const markBuiltInputSchema = transitionInputs['mark-built'].omit({ action: true });

export const yardInputSchema = z.strictObject({
  label: z.string().trim().min(1, 'name the yard, e.g. "Main yard"').max(80, 'must be at most 80 characters'),
  lat: finite('latitude').min(-90, 'latitude is between -90 and 90').max(90, 'latitude is between -90 and 90'),
  lng: finite('longitude').min(-180, 'longitude is between -180 and 180').max(180, 'longitude is between -180 and 180'),
});
export type YardInput = z.infer<typeof yardInputSchema>;

export const boardQuerySchema = z.object({
  sort: z.enum(['date', 'distance'], { error: 'must be "date" or "distance"' }).default('date'),
});
export type BoardSort = z.infer<typeof boardQuerySchema>['sort'];
