import { z } from 'zod';

// Roles live in ./roles; re-exported here for the many files that already import them from this one.
export { isOfficeRole, roleLabels, roles, roleSchema, type Role } from './roles';

export const requestStatuses = [
  'draft',
  'submitted',
  'needs_details',
  'visit_booked',
  'checked',
  'permit_filed',
  'permit_granted',
  'permit_refused',
  'released',
  'crew_assigned',
  'under_construction',
  'built',
  'closed',
  'declined',
  'withdrawn',
] as const;
export const requestStatusSchema = z.enum(requestStatuses);

/** From release on the request is a crew job: what the board, the field sheet and the as-built pages may show. */
export const crewStages: readonly RequestStatus[] = [
  'released',
  'crew_assigned',
  'under_construction',
  'built',
  'closed',
];

/** From the visit until the crew has the job a grade check may still change; after release the crew builds against it. */
export const gradeCheckOpenStatuses: readonly RequestStatus[] = [
  'visit_booked',
  'checked',
  'permit_filed',
  'permit_refused',
];
export type RequestStatus = z.infer<typeof requestStatusSchema>;

/** Plain-words label and what happens next, as the people involved read them. */
export const statusText: Record<RequestStatus, { label: string; next: string }> = {
  draft: { label: 'Draft', next: 'Finish the form and send it to the office.' },
  submitted: { label: 'Sent to the office', next: 'The office reviews the request and plans a site visit.' },
  needs_details: { label: 'More details needed', next: 'The office has asked a question: answer it to continue.' },
  visit_booked: {
    label: 'Site visit booked',
    next: 'The office surveys the site and checks the entrance against the road rules.',
  },
  checked: { label: 'Grade check done', next: 'The office files the access permit with the road authority.' },
  permit_filed: { label: 'Permit filed', next: 'Waiting for the road authority to decide.' },
  permit_granted: { label: 'Permit granted', next: 'The office releases the job to a crew.' },
  permit_refused: {
    label: 'Permit refused',
    next: 'The office will explain the road authority’s reasons and the options.',
  },
  released: { label: 'Ready for a crew', next: 'A crew lead takes the job and schedules it.' },
  crew_assigned: { label: 'Crew assigned', next: 'The crew schedules the work and lets you know the date.' },
  under_construction: {
    label: 'Being built',
    next: 'The crew is building the entrance and will check the finished grades.',
  },
  built: { label: 'Built, being reviewed', next: 'The office reviews the as-built grades before closing.' },
  closed: { label: 'Finished', next: 'Nothing more to do. Thank you.' },
  declined: { label: 'Declined', next: 'The office has explained why this request cannot go ahead.' },
  withdrawn: { label: 'Withdrawn', next: 'This request was withdrawn and is no longer active.' },
};

/** Statuses in which the ball is in the office's court ("waiting on us"). */
export const waitingOnOffice: readonly RequestStatus[] = [
  'submitted',
  'visit_booked',
  'checked',
  'permit_granted',
  'built',
];

export const terminalStatuses: readonly RequestStatus[] = ['closed', 'declined', 'withdrawn', 'permit_refused'];
