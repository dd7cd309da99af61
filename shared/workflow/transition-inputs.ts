import { z } from 'zod';
import { readLabelsFrom } from '../errors/issue-words';
import { dayInput, momentInput } from './dates';
import { transitionActions, type TransitionAction } from './transitions';

/** How a field of a status change appears on the form: the label its error messages are read next to. */
export interface FieldText {
  label: string;
  hint?: string;
  control: 'text' | 'textarea' | 'date' | 'datetime' | 'choice';
  /** For a choice: the values and their words, the first the one the form starts from. */
  options?: readonly (readonly [string, string])[];
  /** The request's own value to start from, when the change corrects or repeats it. */
  prefill?: 'permitReference' | 'permitConditions';
}
export const fieldText = z.registry<FieldText>();
// Errors about these fields name them by the same labels (shared/errors/issue-words.ts).
readLabelsFrom(fieldText);

export const expectedVersionSchema = z.number({ error: 'must be the version number you loaded' }).int().min(1);

/** The paper the permit packet is set on. */
export const packetPaperSizes = ['letter', 'a4'] as const;
export type PacketPaperSize = (typeof packetPaperSizes)[number];

const text = (max: number) => z.string().trim().max(max, `must be at most ${max} characters`);
const said = (max: number, missing: string) =>
  z.string({ error: missing }).trim().min(1, missing).max(max, `must be at most ${max} characters`);
const dayMs = 86_400_000;

const note = (label: string, hint = 'Shown in the history and the e-mail.') =>
  text(4000).optional().register(fieldText, { label, hint, control: 'textarea' });
const plainNote = note('Note (optional)');
const visitAt = momentInput('pick a date and a time')
  .refine((at) => new Date(at).getTime() >= Date.now() - dayMs, 'must not be in the past')
  .refine((at) => new Date(at).getTime() <= Date.now() + 400 * dayMs, 'must be within the next 13 months');
const permitReference = (required: boolean) =>
  (required ? said(80, 'enter the road authority’s application number') : text(80).optional()).register(fieldText, {
    label: 'Permit reference',
    hint: 'The road authority’s application or permit number.',
    control: 'text',
    prefill: 'permitReference',
  });
const decidedOn = () =>
  z
    .string({ error: 'enter the date the road authority decided' })
    .pipe(dayInput('pick a day from the calendar'))
    .register(fieldText, { label: 'Decided on', control: 'date' });

// Every change may carry a note; an action that asks for it in its own words replaces this one, in the type too.
const input = <A extends TransitionAction, S extends z.ZodRawShape>(action: A, shape: S) =>
  z.strictObject({
    action: z.literal(action),
    expectedVersion: expectedVersionSchema,
    ...({ note: plainNote } as Omit<{ note: typeof plainNote }, keyof S>),
    ...shape,
  });

/**
 * What each status change takes from the person making it. The server parses these; the office's form draws its
 * fields from them, so a field, its label and its rule are written once.
 */
export const transitionInputs = {
  submit: input('submit', {}),
  'ask-details': input('ask-details', {
    note: said(4000, 'write the questions for the homeowner').register(fieldText, {
      label: 'Questions for the homeowner',
      hint: 'Ask plainly; they answer from their request page.',
      control: 'textarea',
    }),
  }),
  answer: input('answer', {
    answer: said(8000, 'write your answer to the office').register(fieldText, {
      label: 'Your answer',
      control: 'textarea',
    }),
  }),
  'book-visit': input('book-visit', {
    visitAt: z
      .string({ error: 'pick the date and time of the site visit' })
      .pipe(visitAt)
      .register(fieldText, { label: 'Date and time of the site visit', control: 'datetime' }),
  }),
  'reschedule-visit': input('reschedule-visit', {
    visitAt: z
      .string({ error: 'pick the new date and time of the site visit' })
      .pipe(visitAt)
      .register(fieldText, { label: 'New date and time of the site visit', control: 'datetime' }),
    note: note('Why it moves (optional)'),
  }),
  'cancel-visit': input('cancel-visit', {
    note: note('Why it is called off (optional)'),
  }),
  'mark-checked': input('mark-checked', {}),
  'file-permit': input('file-permit', {
    permitReference: permitReference(true),
    paperSize: z
      .enum(packetPaperSizes, { error: 'must be letter or a4' })
      .default('letter')
      .register(fieldText, {
        label: 'Permit packet paper size',
        hint: 'The packet filed with the application is stored with the request.',
        control: 'choice',
        options: [
          ['letter', 'Letter'],
          ['a4', 'A4'],
        ],
      }),
  }),
  'record-granted': input('record-granted', {
    permitReference: permitReference(false),
    permitDecidedOn: decidedOn(),
    permitConditions: text(4000).optional().register(fieldText, {
      label: 'Conditions (optional)',
      hint: 'E.g. traffic control, working hours, inspection before paving.',
      control: 'textarea',
      prefill: 'permitConditions',
    }),
    permitExpiresOn: dayInput('pick a day from the calendar')
      .optional()
      .register(fieldText, { label: 'Permit expires on (optional)', control: 'date' }),
  }).refine((b) => !b.permitExpiresOn || b.permitExpiresOn > b.permitDecidedOn, {
    message: 'must be after the decision date',
    path: ['permitExpiresOn'],
  }),
  'record-refused': input('record-refused', {
    permitReference: permitReference(false),
    permitDecidedOn: decidedOn(),
    note: said(4000, 'give the reason, in words the homeowner will read').register(fieldText, {
      label: 'Reason',
      hint: 'The homeowner reads this in the e-mail and on their request page.',
      control: 'textarea',
    }),
  }),
  release: input('release', {
    note: note('Note for the crew (optional)', 'Crew leads read this; the homeowner does not.'),
  }),
  'accept-job': input('accept-job', {}),
  'hand-back': input('hand-back', {
    note: said(2000, 'say why the job goes back on the board').register(fieldText, {
      label: 'Why does it go back on the board?',
      hint: 'The office reads this.',
      control: 'textarea',
    }),
  }),
  'start-work': input('start-work', {}),
  'mark-built': input('mark-built', {
    note: note('Why the readings fail', 'Needed when the last saved set fails; the office reads it before closing.'),
  }),
  'send-back': input('send-back', {
    note: said(4000, 'say what needs doing').register(fieldText, {
      label: 'What needs doing',
      hint: 'The crew reads this.',
      control: 'textarea',
    }),
  }),
  'fail-inspection': input('fail-inspection', {
    inspectorName: said(120, 'enter the inspector’s name').register(fieldText, {
      label: 'Inspector’s name',
      control: 'text',
    }),
    items: said(4000, 'list what must be fixed, one item per line').register(fieldText, {
      label: 'What must be fixed',
      hint: 'One item per line. The crew, the homeowner and the office read these.',
      control: 'textarea',
    }),
  }),
  close: input('close', {
    note: note(
      'Closing note',
      'Needed when the crew’s last as-built readings fail: say why the request closes anyway.',
    ),
  }),
  decline: input('decline', {
    note: said(4000, 'give the reason, in words the homeowner will read').register(fieldText, {
      label: 'Reason',
      hint: 'The homeowner reads this in the e-mail and on their request page.',
      control: 'textarea',
    }),
  }),
  withdraw: input('withdraw', {}),
} satisfies { [A in TransitionAction]: z.ZodType<{ action: A }> };

type Inputs = typeof transitionInputs;
export type TransitionBody = z.infer<Inputs[TransitionAction]>;
export type TransitionBodyOf<A extends TransitionAction> = z.infer<Inputs[A]>;

export const transitionInputSchema = z.discriminatedUnion(
  'action',
  Object.values(transitionInputs) as unknown as [Inputs['submit'], ...Inputs[TransitionAction][]],
  {
    error: (issue) => (issue.code === 'invalid_union' ? `must be one of: ${transitionActions.join(', ')}` : undefined),
  },
);

export interface FormField {
  name: string;
  required: boolean;
  text: FieldText;
}

/** The fields the person fills in for one action, in order, each with its label; action and version are the form's own. */
export function formFieldsOf(action: TransitionAction): FormField[] {
  const shape: Record<string, z.ZodType> = transitionInputs[action].shape;
  // The note closes the form whatever the action: it is what the reader of the e-mail or history sees last.
  const names = Object.keys(shape).sort((a, b) => Number(a === 'note') - Number(b === 'note'));
  return names.flatMap((name) => {
    const found = fieldText.get(shape[name]);
    return found ? [{ name, required: !shape[name].safeParse(undefined).success, text: found }] : [];
  });
}
