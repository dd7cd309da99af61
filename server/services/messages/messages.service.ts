import { and, asc, eq, inArray } from 'drizzle-orm';
import { isOfficeRole } from '@shared/workflow/statuses';
import type { MessageVisibility } from '@shared/contracts/messages';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import type { Db, Tx } from '../../db/client';
import { messages, users } from '../../db/schema';
import { badRequest, conflict, notFound } from '../../lib/errors';
import { messageEmails } from '../email/message-emails';
import { enqueueEmails } from '../email/outbox';
import { loadVisibleRequest, type RequestRow } from '../requests/request-access';

type Visibility = MessageVisibility;

/** Crew talk with the office only about a job they hold, not about every job waiting on the board. */
async function loadForMessages(db: Db, user: SessionUser, requestId: string): Promise<RequestRow> {
  const row = await loadVisibleRequest(db, user, requestId);
  if (user.role === 'crew' && row.crewId !== user.id) throw notFound('Request');
  return row;
}

export async function listMessages(db: Db, user: SessionUser, requestId: string) {
  await loadForMessages(db, user, requestId);
  const office = isOfficeRole(user.role);
  const where = office
    ? eq(messages.requestId, requestId)
    : and(eq(messages.requestId, requestId), eq(messages.visibility, 'shared'));
  const rows = await db
    .select({
      id: messages.id,
      body: messages.body,
      visibility: messages.visibility,
      createdAt: messages.createdAt,
      authorName: users.name,
      authorRole: users.role,
      authorId: messages.authorId,
    })
    .from(messages)
    .innerJoin(users, eq(users.id, messages.authorId))
    .where(where)
    .orderBy(asc(messages.createdAt));
  return rows.map(({ visibility, ...m }) => ({
    ...m,
    mine: m.authorId === user.id,
    ...(office ? { internal: visibility === 'internal' } : {}),
  }));
}

async function emailsForMessage(
  tx: Tx,
  env: AppContext['env'],
  row: RequestRow,
  author: SessionUser,
  message: { body: string; visibility: Visibility },
) {
  if (message.visibility === 'internal') return [];
  const people = await tx
    .select({ id: users.id, email: users.email, name: users.name })
    .from(users)
    .where(inArray(users.id, row.crewId ? [row.applicantId, row.crewId] : [row.applicantId]));
  const applicant = people.find((p) => p.id === row.applicantId)!;
  const crew = people.find((p) => p.id === row.crewId) ?? null;
  return messageEmails({
    request: row,
    author,
    body: message.body,
    visibility: message.visibility,
    applicant,
    crew,
    officeEmail: env.OFFICE_EMAIL,
    appOrigin: env.APP_ORIGIN,
  });
}

/** Saves a message and, in the same transaction, the e-mails that tell the others on the request about it. */
export async function postMessage(
  ctx: Pick<AppContext, 'db' | 'env'>,
  user: SessionUser,
  requestId: string,
  input: { body: string; visibility?: Visibility },
) {
  const row = await loadForMessages(ctx.db, user, requestId);
  const office = isOfficeRole(user.role);
  // The office decides each time; its default keeps a slip of the hand from reaching the homeowner.
  const visibility = input.visibility ?? (office ? 'internal' : 'shared');
  if (!office && visibility === 'internal') {
    throw badRequest('Only the office can write internal notes.', {
      visibility: 'messages from you are always shared with the office',
    });
  }
  if (!office && row.status === 'draft')
    throw conflict('Send the request to the office first; then you can write to them here.');
  const message = await ctx.db.transaction(async (tx) => {
    const [saved] = await tx
      .insert(messages)
      .values({ requestId, authorId: user.id, visibility, body: input.body })
      .returning();
    await enqueueEmails(tx, await emailsForMessage(tx, ctx.env, row, user, saved));
    return saved;
  });
  return {
    id: message.id,
    body: message.body,
    createdAt: message.createdAt,
    authorId: user.id,
    authorName: user.name,
    authorRole: user.role,
    mine: true,
    ...(office ? { internal: visibility === 'internal' } : {}),
  };
}
