import { z } from 'zod';
import type { AsBuiltReadingResult, AsBuiltStatus } from '../engine';
import type { RequestStatus } from '../workflow/statuses';
import type { CrewPhotoView } from './crew-photos';
import type { Moment } from './wire';

/** The header the inspector's page sends its link's token in (read from the page address's #fragment). */
export const inspectorTokenHeader = 'x-inspector-token';
export const defaultLinkDays = 14;
export const maxLinkDays = 60;

/** POST /api/requests/:id/inspector-links (office): who the link goes to and how long it works. */
export const sendInspectorLinkInputSchema = z.strictObject({
  inspectorName: z
    .string({ error: 'Enter the inspector’s name.' })
    .trim()
    .min(1, 'Enter the inspector’s name.')
    .max(120, 'Keep the name under 120 characters.'),
  inspectorEmail: z
    .string({ error: 'Enter the inspector’s e-mail address.' })
    .trim()
    .pipe(z.email('Enter an e-mail address such as name@county.gov.').max(254, 'That address is too long.')),
  daysValid: z
    .number({ error: 'Enter a number of days.' })
    .int('Enter a whole number of days.')
    .min(1, 'The link must work for at least 1 day.')
    .max(maxLinkDays, `A link can work for at most ${maxLinkDays} days.`)
    .default(defaultLinkDays),
});
export type SendInspectorLinkInput = z.input<typeof sendInspectorLinkInputSchema>;

/** POST /api/inspect/:id/outcome (the inspector, holding the link). */
export const inspectionOutcomeInputSchema = z
  .strictObject({
    outcome: z.enum(['passed', 'failed'], { error: 'Choose passed or failed.' }),
    inspectorName: z
      .string({ error: 'Enter your name.' })
      .trim()
      .min(1, 'Enter your name.')
      .max(120, 'Keep the name under 120 characters.'),
    items: z.string({ error: 'Must be text.' }).trim().max(4000, 'Keep the list under 4000 characters.').default(''),
    note: z.string({ error: 'Must be text.' }).trim().max(2000, 'Keep the note under 2000 characters.').default(''),
  })
  .refine((b) => b.outcome === 'passed' || itemLines(b.items).length > 0, {
    message: 'List what must be fixed, one item per line.',
    path: ['items'],
  });
export type InspectionOutcomeInput = z.input<typeof inspectionOutcomeInputSchema>;

/** The items to fix, one per line, blank lines and list marks dropped. */
export function itemLines(text: string): string[] {
  return text
    .split(/\r?\n/)
    .map((line) => line.replace(/^\s*(?:[-*•]|\d+[.)])\s*/, '').trim())
    .filter(Boolean)
    .slice(0, 50);
}

export type InspectorLinkState = 'open' | 'expired' | 'withdrawn' | 'used';
export const inspectorLinkStateLabels: Record<InspectorLinkState, string> = {
  open: 'Open',
  expired: 'Expired',
  withdrawn: 'Withdrawn',
  used: 'Outcome recorded',
};

/** A link as the office sees it; the token itself is shown once, when the link is made. */
export interface InspectorLinkView<When extends Moment = string> {
  id: string;
  inspectorName: string;
  inspectorEmail: string;
  createdAt: When;
  expiresAt: When;
  revokedAt: When | null;
  lastOpenedAt: When | null;
  outcomeAt: When | null;
  state: InspectorLinkState;
}

export interface InspectionView<When extends Moment = string> {
  id: string;
  passed: boolean;
  inspectorName: string;
  items: string[];
  note: string;
  createdAt: When;
}

/** GET /api/requests/:id/inspections (office, owner, crew on the job). */
export interface InspectionsAnswer<When extends Moment = string> {
  inspections: InspectionView<When>[];
  /** Office only: the links sent for this request. */
  links?: InspectorLinkView<When>[];
  /** Whether the rule profile the job was checked under needs a passed inspection before closing. */
  inspectionRequired: boolean;
}

/** POST /api/requests/:id/inspector-links answers the link once: the office may copy it as well as e-mail it. */
export interface SentInspectorLink<When extends Moment = string> {
  link: InspectorLinkView<When>;
  url: string;
}

/**
 * GET /api/inspect/:id: everything the inspector's page shows, and nothing internal: no notes or events of the
 * office, no people's addresses or telephone numbers, no other request. The office's own address is the one contact.
 */
export interface InspectorPageView<When extends Moment = string> {
  request: {
    id: string;
    reference: string;
    siteAddress: string;
    roadName: string;
    status: RequestStatus;
    statusLabel: string;
    builtAt: When | null;
  };
  officeEmail: string;
  authority: { name: string; authority: string } | null;
  permit: {
    reference: string | null;
    decidedOn: string | null;
    conditions: string | null;
    expiresOn: string | null;
  };
  /** The stored permit packet, when one exists, else the attached grade check report. */
  documents: { title: string; kind: string; url: string }[];
  gradeCheck: { number: number; summary: string; passed: boolean; ruleProfileLabel: string } | null;
  asBuilt: {
    status: AsBuiltStatus;
    passed: boolean;
    readings: AsBuiltReadingResult[];
    takenAt: When;
  } | null;
  crewNote: string;
  crewPhotos: (Omit<CrewPhotoView<When>, 'takenBy'> & { url: string })[];
  inspections: InspectionView<When>[];
  link: { inspectorName: string; expiresAt: When; canRecord: boolean; whyNot: string | null };
  cautions: string[];
}
