import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  bigint,
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
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { requestStatuses, roles, terminalStatuses } from '@shared/workflow/statuses';

/** A file sent with an e-mail: text (a calendar invitation) or, with `encoding: 'base64'`, bytes (a quote's PDF). */
export interface EmailAttachment {
  filename: string;
  contentType: string;
  content: string;
  encoding?: 'base64';
}

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });
const createdAt = () => timestamp({ withTimezone: true }).notNull().defaultNow();

export const roleEnum = pgEnum('role', roles);
export const requestStatusEnum = pgEnum('request_status', requestStatuses);
export const messageVisibilityEnum = pgEnum('message_visibility', ['internal', 'shared']);
export const ruleProfileStatusEnum = pgEnum('rule_profile_status', ['draft', 'published']);
export const photoStatusEnum = pgEnum('photo_status', ['pending', 'stored', 'removed']);
export const emailStatusEnum = pgEnum('email_status', ['queued', 'sending', 'sent', 'failed', 'dead']);
export const rateCardStatusEnum = pgEnum('rate_card_status', ['draft', 'published']);
/** A quote's own life; `replaced` is a sent quote a later version took over from. */
export const quoteStatusEnum = pgEnum('quote_status', ['draft', 'sent', 'accepted', 'declined', 'replaced']);

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
    /** The site visit's calendar revision: raised each time the visit's invitation is sent again (moved or cancelled). */
    visitSequence: integer().notNull().default(0),
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
    /** Null for the owner's site photos; a crew photo says what it shows (shared/contracts/crew-photos.ts). */
    kind: text(),
    /** A crew photo's device-made key: registering it again answers the same row. */
    idempotencyKey: uuid(),
    createdAt: createdAt(),
    storedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    index('photos_request_idx').on(t.requestId, t.status),
    uniqueIndex('photos_request_idempotency_key').on(t.requestId, t.idempotencyKey),
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

/**
 * The survey as it is being typed, kept per request and person so leaving the screen loses nothing. Saving a check
 * from it removes it (the saved check is the record); it holds the form's own text, not the engine's inputs.
 */
export const gradeCheckDrafts = pgTable(
  'grade_check_drafts',
  {
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    userId: uuid()
      .notNull()
      .references(() => users.id),
    survey: jsonb().notNull(),
    /** The rule profile version chosen with the survey, when one was. */
    ruleProfileVersionId: uuid().references(() => ruleProfileVersions.id),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.requestId, t.userId] })],
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
    /** The work day's calendar revision: raised each time the day moves or is called off. */
    workDaySequence: integer().notNull().default(0),
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
    /** The set this one corrects (the crew edited and saved it again); the earlier one stays as it was. */
    replacesSetId: uuid().references((): AnyPgColumn => asBuiltSets.id),
    /** The key the crew's phone chose for this set (the Idempotency-Key header), so a resent set is stored once. */
    idempotencyKey: uuid(),
    /** A digest of what was sent under that key: the same key with other readings is refused, not answered. */
    idempotencyDigest: text(),
    createdAt: createdAt(),
  },
  (t) => [
    index('as_built_sets_request_idx').on(t.requestId, t.createdAt),
    uniqueIndex('as_built_sets_crew_idempotency_key').on(t.crewId, t.idempotencyKey),
  ],
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
    /** Files sent with the message (an invitation, a quote's PDF), kept with the row so a retry sends exactly the same. */
    attachments: jsonb().$type<EmailAttachment[]>().notNull().default([]),
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

/**
 * What administrators changed: a role, a name, a sign-in turned off or on, a person added, a rule profile version
 * published, the crew yard moved. Written in the same transaction as the change; `summary` is the sentence the
 * admin's log screen shows, written once when it happened (names as they were then).
 */
export const adminAuditEntries = pgTable(
  'admin_audit_entries',
  {
    id: uuid().primaryKey().defaultRandom(),
    actorId: uuid().references(() => users.id),
    actorName: text().notNull(),
    kind: text().notNull(),
    summary: text().notNull(),
    subjectId: uuid(),
    detail: jsonb().notNull().default({}),
    createdAt: createdAt(),
  },
  (t) => [index('admin_audit_entries_created_idx').on(t.createdAt)],
);

/**
 * The company's unit prices, versioned like rule profiles: a draft is edited, publishing freezes it and makes it the
 * current card (the highest published version). A quote names the version it priced from. Money is integer cents.
 */
export const rateCardVersions = pgTable(
  'rate_card_versions',
  {
    id: uuid().primaryKey().defaultRandom(),
    version: integer().notNull(),
    status: rateCardStatusEnum().notNull().default('draft'),
    /** The prices as validated by shared/contracts/rate-cards.ts (`rateCardPricesSchema`). */
    prices: jsonb().notNull(),
    changeNote: text().notNull().default(''),
    createdById: uuid().references(() => users.id),
    createdAt: createdAt(),
    publishedAt: timestamp({ withTimezone: true }),
    publishedById: uuid().references(() => users.id),
  },
  (t) => [
    uniqueIndex('rate_card_versions_version_key').on(t.version),
    // One draft at a time.
    uniqueIndex('rate_card_versions_one_draft_key')
      .on(t.status)
      .where(sql`${t.status} = 'draft'`),
  ],
);

/**
 * One version of a request's quote. A draft is edited by the office; sending freezes it (lines, totals, terms) for
 * good. A revision is a new row with the next version; sending it marks the earlier sent one `replaced`.
 */
export const quotes = pgTable(
  'quotes',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    version: integer().notNull(),
    status: quoteStatusEnum().notNull().default('draft'),
    gradeCheckId: uuid()
      .notNull()
      .references(() => gradeChecks.id),
    rateCardVersionId: uuid()
      .notNull()
      .references(() => rateCardVersions.id),
    /** The lines as validated by shared/contracts/quotes.ts (`quoteLineSchema`), each with its amount in cents. */
    lines: jsonb().notNull(),
    subtotalCents: bigint({ mode: 'number' }).notNull(),
    taxCents: bigint({ mode: 'number' }).notNull(),
    totalCents: bigint({ mode: 'number' }).notNull(),
    /** Basis points (1/100 of a percent) copied from the rate card, and the deposit they give. */
    taxRateBp: integer().notNull(),
    depositRateBp: integer().notNull(),
    depositCents: bigint({ mode: 'number' }).notNull(),
    terms: text().notNull().default(''),
    validUntil: date().notNull(),
    documentId: uuid().references(() => documents.id),
    createdById: uuid()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp({ withTimezone: true }),
    sentById: uuid().references(() => users.id),
    /** The owner's answer: the name typed to accept, or the reason to decline. */
    acceptedAt: timestamp({ withTimezone: true }),
    acceptedName: text(),
    acceptedById: uuid().references(() => users.id),
    declinedAt: timestamp({ withTimezone: true }),
    declineReason: text(),
    declinedById: uuid().references(() => users.id),
  },
  (t) => [
    uniqueIndex('quotes_request_version_key').on(t.requestId, t.version),
    // One draft per request at a time.
    uniqueIndex('quotes_request_one_draft_key')
      .on(t.requestId)
      .where(sql`${t.status} = 'draft'`),
  ],
);

export const paymentKindEnum = pgEnum('payment_kind', ['deposit', 'balance']);
export const paymentMethodEnum = pgEnum('payment_method', ['card', 'offline']);
export const checkoutStatusEnum = pgEnum('checkout_status', ['open', 'complete', 'expired']);

/**
 * A payment page asked of the provider for one amount due. While one is open for a request and kind, a second tab
 * gets the same page (the partial unique key); the row's id is the idempotency key of the provider call, so two
 * calls at once still make one page.
 */
export const paymentCheckouts = pgTable(
  'payment_checkouts',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    kind: paymentKindEnum().notNull(),
    /** The amount due when the page was made, from our own records. */
    amountCents: bigint({ mode: 'number' }).notNull(),
    currency: text().notNull(),
    status: checkoutStatusEnum().notNull().default('open'),
    providerSessionId: text().unique(),
    url: text(),
    createdById: uuid()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
  },
  (t) => [
    uniqueIndex('payment_checkouts_one_open_key')
      .on(t.requestId, t.kind)
      .where(sql`${t.status} = 'open'`),
  ],
);

/** Money received, by card through the provider or recorded by the office; one deposit and one balance per request. */
export const payments = pgTable(
  'payments',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    kind: paymentKindEnum().notNull(),
    method: paymentMethodEnum().notNull(),
    amountCents: bigint({ mode: 'number' }).notNull(),
    currency: text().notNull(),
    quoteId: uuid().references(() => quotes.id),
    checkoutId: uuid().references(() => paymentCheckouts.id),
    providerSessionId: text().unique(),
    providerPaymentIntentId: text(),
    note: text().notNull().default(''),
    recordedById: uuid().references(() => users.id),
    paidAt: timestamp({ withTimezone: true }).notNull(),
    createdAt: createdAt(),
    refundedAt: timestamp({ withTimezone: true }),
    refundedCents: bigint({ mode: 'number' }).notNull().default(0),
    providerRefundId: text(),
    refundNote: text().notNull().default(''),
    refundedById: uuid().references(() => users.id),
  },
  (t) => [uniqueIndex('payments_request_kind_key').on(t.requestId, t.kind), index('payments_paid_idx').on(t.paidAt)],
);

/** Every provider notice taken in, by its event id: the same notice delivered twice is acted on once. */
export const paymentProviderEvents = pgTable('payment_provider_events', {
  eventId: text().primaryKey(),
  type: text().notNull(),
  objectId: text(),
  receivedAt: createdAt(),
});

/** Changes to the price agreed with the owner after the quote (more pipe, less base): added to the balance. */
export const balanceChanges = pgTable(
  'balance_changes',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    description: text().notNull(),
    amountCents: bigint({ mode: 'number' }).notNull(),
    createdById: uuid()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('balance_changes_request_idx').on(t.requestId)],
);

/**
 * A link the office sends the road authority's inspector: the token itself is never stored, only its SHA-256, so
 * a copy of the table opens nothing. One link opens one request, until it expires or the office revokes it.
 */
export const inspectorLinks = pgTable(
  'inspector_links',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    tokenHash: text().notNull().unique(),
    inspectorName: text().notNull(),
    inspectorEmail: text().notNull(),
    createdById: uuid()
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    revokedAt: timestamp({ withTimezone: true }),
    revokedById: uuid().references(() => users.id),
    lastOpenedAt: timestamp({ withTimezone: true }),
    /** Set when the inspector records an outcome through it: a link records one outcome. */
    outcomeAt: timestamp({ withTimezone: true }),
  },
  (t) => [index('inspector_links_request_idx').on(t.requestId, t.createdAt)],
);

/** The road authority's inspections of a built entrance, passed or failed with the items to fix. */
export const inspections = pgTable(
  'inspections',
  {
    id: uuid().primaryKey().defaultRandom(),
    requestId: uuid()
      .notNull()
      .references(() => requests.id),
    passed: boolean().notNull(),
    inspectorName: text().notNull(),
    /** What to fix, one line each, when it failed. */
    items: jsonb().notNull().default([]),
    note: text().notNull().default(''),
    /** The link it came through; null when the office recorded an outcome the inspector gave otherwise. */
    linkId: uuid().references(() => inspectorLinks.id),
    recordedById: uuid().references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('inspections_request_idx').on(t.requestId, t.createdAt)],
);
