import type { EmailLogFilter } from '@shared/contracts/emails';
import type { AuditFilter } from '@shared/contracts/audit';
import type { PeopleFilter } from '@shared/contracts/people';

/**
 * One key factory per resource, and one key per endpoint. They live here rather than in their features so that
 * any feature whose change touches a resource (a status change touches the request, its events and its messages)
 * refreshes exactly that resource's queries, without importing the feature that reads it.
 */
export const requestKeys = {
  all: ['requests'] as const,
  /** GET /api/requests/mine */
  mine: () => ['requests', 'mine'] as const,
  /** GET /api/requests/:id, for every reader */
  one: (id: string) => ['requests', 'one', id] as const,
};

/** GET /api/requests/:id/events */
export const eventKeys = { ofRequest: (requestId: string) => ['events', requestId] as const };

/** GET /api/requests/:id/documents */
export const documentKeys = { ofRequest: (requestId: string) => ['documents', requestId] as const };

/** GET /api/requests/:id/messages */
export const messageKeys = { ofRequest: (requestId: string) => ['messages', requestId] as const };

export const photoKeys = {
  /** GET /api/requests/:id/photos */
  ofRequest: (requestId: string) => ['photos', requestId] as const,
  /** GET /api/requests/:id/crew-photos */
  crewOfRequest: (requestId: string) => ['photos', 'crew', requestId] as const,
};

export const peopleKeys = {
  all: ['people'] as const,
  /** GET /api/users?search=&role= */
  list: (filter: PeopleFilter) => ['people', 'list', filter] as const,
};

export const auditKeys = {
  all: ['audit'] as const,
  /** GET /api/audit?kind= */
  list: (filter: AuditFilter) => ['audit', 'list', filter] as const,
};

export const ruleProfileKeys = {
  /** GET /api/jurisdictions */
  list: () => ['rule-profiles', 'list'] as const,
  /** GET /api/jurisdictions/:id */
  one: (jurisdictionId: string) => ['rule-profiles', 'one', jurisdictionId] as const,
  /** GET /api/rule-profile-versions/:id */
  version: (versionId: string) => ['rule-profiles', 'version', versionId] as const,
};

/** The office's queue: every filtered view of GET /api/queue sits under `all`. */
export const queueKeys = {
  all: ['queue'] as const,
  list: (filters: object) => ['queue', 'list', filters] as const,
};

export const gradeCheckKeys = {
  /** GET /api/requests/:id/grade-check-draft: the caller's own survey draft. */
  draft: (requestId: string) => ['grade-checks', requestId, 'draft'] as const,
};

/** GET /api/calendar?from=&to= */
export const calendarKeys = { range: (from: string, to: string) => ['calendar', from, to] as const };

export const emailKeys = {
  /** Every page of GET /api/emails, whatever the filter. */
  lists: () => ['emails', 'list'] as const,
  list: (filter: EmailLogFilter) => ['emails', 'list', filter] as const,
  /** GET /api/emails/:id */
  one: (id: string) => ['emails', 'one', id] as const,
};

export const inspectionKeys = {
  /** GET /api/requests/:id/inspections */
  ofRequest: (requestId: string) => ['inspections', requestId] as const,
  /** GET /api/inspect/:id (the inspector's page, by its link) */
  page: (requestId: string) => ['inspections', 'page', requestId] as const,
};

export const paymentKeys = {
  /** Every request's GET /api/requests/:id/payments. */
  requests: () => ['payments', 'request'] as const,
  /** GET /api/requests/:id/payments */
  ofRequest: (requestId: string) => ['payments', 'request', requestId] as const,
  /** Every filtered view of GET /api/payments. */
  lists: () => ['payments', 'list'] as const,
  list: (state: string) => ['payments', 'list', state] as const,
  /** GET /api/settings/payment-waits */
  waits: () => ['payments', 'waits'] as const,
};

/**
 * What a status change on one request can alter: the request, its history, (for an answer) its messages and (for a
 * failed inspection) its inspections.
 */
export const statusChangeKeys = (requestId: string) => [
  requestKeys.one(requestId),
  eventKeys.ofRequest(requestId),
  messageKeys.ofRequest(requestId),
  inspectionKeys.ofRequest(requestId),
  // What is due, and what waits for money, follow the status (the balance is due once built).
  paymentKeys.ofRequest(requestId),
];

/** GET /api/requests/:id/quotes */
export const quoteKeys = { ofRequest: (requestId: string) => ['quotes', requestId] as const };

/** GET /api/rate-cards */
export const rateCardKeys = { list: () => ['rate-cards', 'list'] as const };

/** Documents travel with the request's own answer; events with the timeline. */
export const quoteChangeKeys = (requestId: string) => [
  quoteKeys.ofRequest(requestId),
  requestKeys.one(requestId),
  eventKeys.ofRequest(requestId),
  // An accepted quote makes the deposit due.
  paymentKeys.ofRequest(requestId),
  // Filing the permit stores the packet it sent.
  documentKeys.ofRequest(requestId),
];
