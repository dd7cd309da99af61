import { sql } from 'drizzle-orm';
import {
  bigint,
  type AnyPgColumn,
  bigserial,
  boolean,
  customType,
  date,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { requestStatuses, roles, terminalStatuses } from '@shared/workflow/statuses';

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });
const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();

export const roleEnum = pgEnum('role', roles);
export const requestStatusEnum = pgEnum('request_status', requestStatuses);
export const messageVisibilityEnum = pgEnum('message_visibility', ['internal', 'shared']);
export const ruleProfileStatusEnum = pgEnum('rule_profile_status', ['draft', 'published']);
export const photoStatusEnum = pgEnum('photo_status', ['pending', 'stored', 'removed']);
export const emailStatusEnum = pgEnum('email_status', ['queued', 'sending', 'sent', 'failed', 'dead']);

export const users = pgTable(
  'users',
  {
    id: uuid().primaryKey().defaultRandom(),
    email: text().notNull(),
    name: text().notNull(),
    role: roleEnum().notNull().default('applicant'),
    googleSub: text(),
    disabled: boolean().notNull().default(false),
    createdAt: createdAt(),
    lastSignInAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    uniqueIndex('users_email_key').on(sql`lower(${t.email})`),
    uniqueIndex('users_google_sub_key').on(t.googleSub),
    index('users_role_idx').on(t.role),
  ],
);

/** connect-pg-simple's table, created by a migration rather than at run time. */
export const session = pgTable(
  'session',
  {
    sid: varchar().primaryKey(),
    sess: jsonb().notNull(),
    expire: timestamp({ precision: 6 }).notNull(),
  },
  (t) => [index('session_expire_idx').on(t.expire)],
);

export const jurisdictions = pgTable('jurisdictions', {
  id: uuid().primaryKey().defaultRandom(),
  slug: text().notNull().unique(),
  name: text().notNull(),
  authority: text().notNull(),
  currentVersionId: uuid(),
  createdAt: createdAt(),
});

export const ruleProfileVersions = pgTable(
  'rule_profile_versions',
  {
    id: uuid().primaryKey().defaultRandom(),
    jurisdictionId: uuid()
      .notNull()
      .references(() => jurisdictions.id),
    version: integer().notNull(),
    status: ruleProfileStatusEnum().notNull().default('draft'),
    /** The limits as validated by shared/engine's rule profile schema, with a source note per value. */
    profile: jsonb().notNull(),
    changeNote: text().notNull().default(''),
    createdById: uuid().references(() => users.id),
    createdAt: createdAt(),
    publishedAt: timestamp({ withTimezone: true }),
    publishedById: uuid().references(() => users.id),
  },
  (t) => [uniqueIndex('rule_profile_versions_jurisdiction_version_key').on(t.jurisdictionId, t.version)],
);

export const requests = pgTable(
  'requests',
  {
    id: uuid().primaryKey().defaultRandom(),
    reference: text().notNull().unique(),
    applicantId: uuid()
      .notNull()
      .references(() => users.id),
    status: requestStatusEnum().notNull().default('draft'),
    /** Optimistic concurrency: every change must name the version it read. */
    version: integer().notNull().default(1),
    statusChangedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    jurisdictionId: uuid().references(() => jurisdictions.id),
    assigneeId: uuid().references(() => users.id),
    crewId: uuid().references(() => users.id),
    /** The applicant's answers, validated by the wizard schema in shared/. */
    application: jsonb().notNull().default({}),
    wizardStep: integer().notNull().default(0),
    applicantName: text().notNull().default(''),
    siteAddress: text().notNull().default(''),
    roadName: text().notNull().default(''),
    siteLat: doublePrecision(),
    siteLng: doublePrecision(),
    visitAt: timestamp({ withTimezone: true }),
    permitReference: text(),
    permitDecidedOn: date(),
    permitConditions: text(),
    permitExpiresOn: date(),
    submittedAt: timestamp({ withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    searchVector: tsvector().generatedAlwaysAs(
      sql`to_tsvector('simple', reference || ' ' || applicant_name || ' ' || site_address || ' ' || road_name)`,
    ),
    /** In one of the statuses nothing follows (finished, declined, withdrawn, refused): waiting on nobody. */
    ended: boolean()
      .notNull()
      .generatedAlwaysAs(sql.raw(`status in (${terminalStatuses.map((s) => `'${s}'`).join(', ')})`)),
  },
  (t) => [
    index('requests_applicant_idx').on(t.applicantId, t.updatedAt),
    index('requests_status_changed_idx').on(t.status, t.statusChangedAt, t.id),
    // Oldest wait first keeps ended requests last in both directions: newest first reads the second index backwards.
    index('requests_waiting_idx').on(t.ended, t.statusChangedAt, t.id),
    index('requests_waiting_newest_idx').on(sql`(not ${t.ended})`, t.statusChangedAt, t.id),
    index('requests_jurisdiction_idx').on(t.jurisdictionId, t.statusChangedAt),
    index('requests_assignee_idx').on(t.assigneeId, t.statusChangedAt),
    index('requests_crew_idx').on(t.crewId, t.status),
    index('requests_created_idx').on(t.createdAt, t.id),
    // The office queue sorts by applicant and by road too; keyset paging needs the id as the tie-break.
    index('requests_applicant_name_idx').on(t.applicantName, t.id),
    index('requests_road_name_idx').on(t.roadName, t.id),
    // A status filter combined with an authority or an assignee is the office's everyday view.
    index('requests_jurisdiction_status_idx').on(t.jurisdictionId, t.status),
    // One authority's requests in one status, by applicant: read in order straight from the index.
    index('requests_jurisdiction_status_applicant_idx').on(t.jurisdictionId, t.status, t.applicantName, t.id),
    index('requests_assignee_status_idx').on(t.assigneeId, t.status),
    index('requests_search_idx').using('gin', t.searchVector),
  ],
);

export const requestEvents = pgTable(
  'request_events',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    actorId: uuid().references(() => users.id),
    kind: text().notNull().default('transition'),
    fromStatus: requestStatusEnum(),
    toStatus: requestStatusEnum(),
    note: text().notNull().default(''),
    /** Internal events (assignment, internal notes) never reach the applicant. */
    internal: boolean().notNull().default(false),
    /** The document the event is about (the permit packet filed, the authority's letter), opened from the timeline. */
    documentId: uuid().references((): AnyPgColumn => documents.id),
    createdAt: createdAt(),
  },
  (t) => [index('request_events_request_idx').on(t.requestId, t.createdAt)],
);

export const messages = pgTable(
  'messages',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    authorId: uuid()
      .notNull()
      .references(() => users.id),
    visibility: messageVisibilityEnum().notNull().default('shared'),
    body: text().notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('messages_request_idx').on(t.requestId, t.createdAt)],
);

export const photos = pgTable(
  'photos',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    uploaderId: uuid()
      .notNull()
      .references(() => users.id),
    objectKey: text().notNull().unique(),
    fileName: text().notNull(),
    contentType: text().notNull(),
    sizeBytes: integer().notNull(),
    caption: text().notNull().default(''),
    status: photoStatusEnum().notNull().default('pending'),
    gpsLat: doublePrecision(),
    gpsLng: doublePrecision(),
    createdAt: createdAt(),
    storedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('photos_request_idx').on(t.requestId, t.status),
    // The clean-up of uploads that were never confirmed reads only these.
    index('photos_pending_idx')
      .on(t.createdAt)
      .where(sql`${t.status} = 'pending'`),
  ],
);

export const gradeChecks = pgTable(
  'grade_checks',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    number: integer().notNull(),
    ruleProfileVersionId: uuid()
      .notNull()
      .references(() => ruleProfileVersions.id),
    engineVersion: text().notNull(),
    // The shape of inputs and results (shared/grade-check/stored-check.ts); rows from before it existed are 1.
    formatVersion: integer().notNull().default(1),
    inputs: jsonb().notNull(),
    results: jsonb().notNull(),
    passed: boolean().notNull(),
    summary: text().notNull(),
    attachedAt: timestamp({ withTimezone: true }),
    createdById: uuid()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('grade_checks_request_number_key').on(t.requestId, t.number)],
);

export const documents = pgTable(
  'documents',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    gradeCheckId: uuid().references(() => gradeChecks.id),
    kind: text().notNull(),
    title: text().notNull(),
    objectKey: text().notNull().unique(),
    contentType: text().notNull(),
    sizeBytes: integer().notNull(),
    sharedWithApplicant: boolean().notNull().default(false),
    createdById: uuid().references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('documents_request_idx').on(t.requestId)],
);

/** A released request becomes a crew job; `crewId` is taken with a conditional update so one crew wins. */
export const jobs = pgTable(
  'jobs',
  {
    requestId: uuid()
      .primaryKey()
      .references(() => requests.id),
    gradeCheckId: uuid().references(() => gradeChecks.id),
    releasedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    crewId: uuid().references(() => users.id),
    acceptedAt: timestamp({ withTimezone: true }),
    scheduledFor: date(),
    startedAt: timestamp({ withTimezone: true }),
    builtAt: timestamp({ withTimezone: true }),
  },
  (t) => [index('jobs_crew_idx').on(t.crewId)],
);

export const asBuiltSets = pgTable(
  'as_built_sets',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    gradeCheckId: uuid()
      .notNull()
      .references(() => gradeChecks.id),
    crewId: uuid()
      .notNull()
      .references(() => users.id),
    readings: jsonb().notNull(),
    results: jsonb().notNull(),
    passed: boolean().notNull(),
    note: text().notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('as_built_sets_request_idx').on(t.requestId, t.createdAt)],
);

/** The outbox and the e-mail log in one: rows are written in the transaction that triggers them. */
export const emails = pgTable(
  'emails',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid().references(() => requests.id),
    eventId: bigint({ mode: 'number' }),
    template: text().notNull(),
    toAddress: text().notNull(),
    subject: text().notNull(),
    textBody: text().notNull(),
    htmlBody: text().notNull(),
    status: emailStatusEnum().notNull().default('queued'),
    attempts: integer().notNull().default(0),
    lastError: text(),
    messageId: text(),
    createdAt: createdAt(),
    sentAt: timestamp({ withTimezone: true }),
    /**
     * When the row may next be claimed: for `queued` when written (or sent again), for `failed` the backoff's next
     * try, for `sending` the end of the sender's lease (a sender that dies stops renewing it).
     */
    nextAttemptAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    /** The claim in force while `sending`: only its holder may renew the lease or record the outcome. */
    leaseToken: uuid(),
    /** Set at the first failure; a failure after it makes the row `dead`. Sending again clears it. */
    retryUntil: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('emails_status_idx').on(t.status, t.createdAt),
    index('emails_request_idx').on(t.requestId),
    index('emails_due_idx')
      .on(t.nextAttemptAt)
      .where(sql`${t.status} in ('queued', 'failed', 'sending')`),
  ],
);

export const settings = pgTable('settings', {
  key: text().primaryKey(),
  value: jsonb().notNull(),
  updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

export const referenceCounter = pgTable('reference_counters', {
  year: integer().primaryKey(),
  last: integer().notNull().default(0),
});

/** Request counters behind the rate limits, shared by every instance (rate-limiter-flexible's Drizzle store). */
export const rateLimits = pgTable(
  'rate_limits',
  {
    key: varchar({ length: 255 }).primaryKey(),
    points: integer().notNull().default(0),
    expire: timestamp({ withTimezone: true }),
  },
  (t) => [index('rate_limits_expire_idx').on(t.expire)],
);
