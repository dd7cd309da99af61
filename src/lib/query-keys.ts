import type { EmailLogFilter } from '@shared/contracts/emails';
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

/** GET /api/requests/:id/photos */
export const photoKeys = { ofRequest: (requestId: string) => ['photos', requestId] as const };

export const peopleKeys = {
  all: ['people'] as const,
  /** GET /api/users?search=&role= */
  list: (filter: PeopleFilter) => ['people', 'list', filter] as const,
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

export const emailKeys = {
  /** Every page of GET /api/emails, whatever the filter. */
  lists: () => ['emails', 'list'] as const,
  list: (filter: EmailLogFilter) => ['emails', 'list', filter] as const,
  /** GET /api/emails/:id */
  one: (id: string) => ['emails', 'one', id] as const,
};

/** What a status change on one request can alter: the request, its history and (for an answer) its messages. */
export const statusChangeKeys = (requestId: string) => [
  requestKeys.one(requestId),
  eventKeys.ofRequest(requestId),
  messageKeys.ofRequest(requestId),
  // Filing the permit stores the packet it sent.
  documentKeys.ofRequest(requestId),
];
