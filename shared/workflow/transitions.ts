import type { RequestStatus, Role } from './statuses';

export const transitionActions = [
  'submit',
  'ask-details',
  'answer',
  'book-visit',
  'reschedule-visit',
  'cancel-visit',
  'mark-checked',
  'file-permit',
  'record-granted',
  'record-refused',
  'release',
  'accept-job',
  'hand-back',
  'start-work',
  'mark-built',
  'send-back',
  'fail-inspection',
  'close',
  'decline',
  'withdraw',
] as const;
export type TransitionAction = (typeof transitionActions)[number];

/**
 * What must already be on the request before the change, beyond what its form asks for (the form's fields come
 * from the action's input schema in transition-inputs.ts).
 */
export type TransitionNeed = 'gradeCheck' | 'asBuilt';

export interface Transition {
  action: TransitionAction;
  from: RequestStatus;
  to: RequestStatus;
  roles: readonly Role[];
  label: string;
  needs: readonly TransitionNeed[];
}

const office = ['staff', 'admin'] as const;
const crew = ['crew'] as const;
const beforeCrew: RequestStatus[] = [
  'draft',
  'submitted',
  'needs_details',
  'visit_booked',
  'checked',
  'permit_filed',
  'permit_granted',
  'released',
];
const declinable: RequestStatus[] = ['submitted', 'needs_details', 'visit_booked', 'checked', 'permit_filed'];

/** The one table of allowed status changes. Anything not listed here is refused by the server. */
export const transitions: readonly Transition[] = [
  { action: 'submit', from: 'draft', to: 'submitted', roles: ['applicant'], label: 'Send to the office', needs: [] },
  { action: 'ask-details', from: 'submitted', to: 'needs_details', roles: office, label: 'Ask for details', needs: [] },
  {
    action: 'answer',
    from: 'needs_details',
    to: 'submitted',
    roles: ['applicant'],
    label: 'Send my answer',
    needs: [],
  },
  {
    action: 'book-visit',
    from: 'submitted',
    to: 'visit_booked',
    roles: office,
    label: 'Book the site visit',
    needs: [],
  },
  {
    action: 'reschedule-visit',
    from: 'visit_booked',
    to: 'visit_booked',
    roles: office,
    label: 'Move the site visit',
    needs: [],
  },
  {
    action: 'cancel-visit',
    from: 'visit_booked',
    to: 'submitted',
    roles: office,
    label: 'Call off the site visit',
    needs: [],
  },
  {
    action: 'mark-checked',
    from: 'visit_booked',
    to: 'checked',
    roles: office,
    label: 'Mark grade check done',
    needs: ['gradeCheck'],
  },
  {
    action: 'file-permit',
    from: 'checked',
    to: 'permit_filed',
    roles: office,
    label: 'Record permit filed',
    needs: [],
  },
  {
    action: 'record-granted',
    from: 'permit_filed',
    to: 'permit_granted',
    roles: office,
    label: 'Record permit granted',
    needs: [],
  },
  {
    action: 'record-refused',
    from: 'permit_filed',
    to: 'permit_refused',
    roles: office,
    label: 'Record permit refused',
    needs: [],
  },
  { action: 'release', from: 'permit_granted', to: 'released', roles: office, label: 'Release to crews', needs: [] },
  { action: 'accept-job', from: 'released', to: 'crew_assigned', roles: crew, label: 'Take this job', needs: [] },
  { action: 'hand-back', from: 'crew_assigned', to: 'released', roles: crew, label: 'Hand the job back', needs: [] },
  {
    action: 'start-work',
    from: 'crew_assigned',
    to: 'under_construction',
    roles: crew,
    label: 'Start work',
    needs: [],
  },
  {
    action: 'mark-built',
    from: 'under_construction',
    to: 'built',
    roles: crew,
    label: 'Mark built',
    needs: ['asBuilt'],
  },
  {
    action: 'send-back',
    from: 'built',
    to: 'under_construction',
    roles: office,
    label: 'Send back to the crew',
    needs: [],
  },
  {
    action: 'fail-inspection',
    from: 'built',
    to: 'under_construction',
    roles: office,
    label: 'Record a failed inspection',
    needs: [],
  },
  { action: 'close', from: 'built', to: 'closed', roles: office, label: 'Close the request', needs: [] },
  ...declinable.map((from) => ({
    action: 'decline' as const,
    from,
    to: 'declined' as const,
    roles: office,
    label: 'Decline',
    needs: [] as const,
  })),
  ...beforeCrew.map((from) => ({
    action: 'withdraw' as const,
    from,
    to: 'withdrawn' as const,
    roles: ['applicant'] as const,
    label: 'Withdraw my request',
    needs: [] as const,
  })),
];

/** An action as its button says it ("Record the permit granted"), for messages that name it. */
export function actionLabel(action: string): string {
  return transitions.find((t) => t.action === action)?.label ?? 'That change';
}

export function findTransition(from: RequestStatus, action: string): Transition | undefined {
  return transitions.find((t) => t.from === from && t.action === action);
}

export function allowedTransitions(from: RequestStatus, role: Role): Transition[] {
  return transitions.filter((t) => t.from === from && t.roles.includes(role));
}
