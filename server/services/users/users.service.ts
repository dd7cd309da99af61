import { and, asc, eq, ilike, or, sql } from 'drizzle-orm';
import { roleLabels, type Role } from '@shared/workflow/statuses';
import type { Db, DbOrTx } from '../../db/client';
import { recordAdminChange } from '../audit/audit.service';
import { users } from '../../db/schema';
import { conflict, forbidden, notFound } from '../../lib/errors';
import type { SessionUser } from '../../lib/session-user';

const publicColumns = { id: users.id, email: users.email, name: users.name, role: users.role };

export interface ProviderProfile {
  sub: string;
  email: string;
  name: string;
}

/** A person whose sign-in an administrator turned off; the sign-in page tells them so in these words. */
export class SignInTurnedOffError extends Error {
  constructor(readonly companyName?: string) {
    super(
      `Your sign-in has been turned off by ${companyName ?? 'the company'}. If you think this is a mistake, ask the office to turn it back on.`,
    );
  }
}
const signInTurnedOff = () => new SignInTurnedOffError();

/** Sign-in: a known subject or e-mail keeps its role; an unknown e-mail becomes an applicant. */
export async function signInWithProfile(db: DbOrTx, profile: ProviderProfile): Promise<SessionUser> {
  const email = profile.email.trim().toLowerCase();
  const [existing] = await db
    .select()
    .from(users)
    .where(or(eq(users.googleSub, profile.sub), sql`lower(${users.email}) = ${email}`))
    .limit(1);
  if (existing?.disabled) throw signInTurnedOff();
  if (existing) {
    const [updated] = await db
      .update(users)
      .set({ googleSub: profile.sub, name: existing.name || profile.name, lastSignInAt: new Date() })
      .where(eq(users.id, existing.id))
      .returning(publicColumns);
    return updated;
  }
  const [created] = await db
    .insert(users)
    .values({ email, name: profile.name || email, role: 'applicant', googleSub: profile.sub, lastSignInAt: new Date() })
    .onConflictDoNothing()
    .returning(publicColumns);
  if (created) return created;
  // Two first sign-ins at once: the other one created the row.
  const [raced] = await db
    .select(publicColumns)
    .from(users)
    .where(sql`lower(${users.email}) = ${email}`);
  return raced;
}

export async function findSessionUser(db: DbOrTx, id: string): Promise<SessionUser | null> {
  const [user] = await db
    .select(publicColumns)
    .from(users)
    .where(and(eq(users.id, id), eq(users.disabled, false)));
  return user ?? null;
}

export async function listUsers(db: DbOrTx, opts: { search?: string; role?: Role }) {
  const filters = [];
  if (opts.role) filters.push(eq(users.role, opts.role));
  if (opts.search) filters.push(or(ilike(users.email, `%${opts.search}%`), ilike(users.name, `%${opts.search}%`)));
  return db
    .select({
      ...publicColumns,
      disabled: users.disabled,
      createdAt: users.createdAt,
      lastSignInAt: users.lastSignInAt,
    })
    .from(users)
    .where(filters.length ? and(...filters) : undefined)
    .orderBy(asc(users.name))
    .limit(500);
}

/**
 * An administrator changes a person's name, role or sign-in; each change is written to the administrators' log in
 * the same transaction, by the names as they were.
 */
export async function setUserAccess(
  db: Db,
  actor: SessionUser,
  id: string,
  change: { name?: string; role?: Role; disabled?: boolean },
) {
  if (id === actor.id && ((change.role !== undefined && change.role !== 'admin') || change.disabled)) {
    throw forbidden('You cannot remove your own administrator access.');
  }
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(users).where(eq(users.id, id)).for('update');
    if (!before) throw notFound('Person');
    const [updated] = await tx
      .update(users)
      .set(change)
      .where(eq(users.id, id))
      .returning({ ...publicColumns, disabled: users.disabled });
    const who = before.name || before.email;
    if (change.name !== undefined && change.name !== before.name)
      await recordAdminChange(tx, actor, {
        kind: 'name-changed',
        subjectId: id,
        summary: `Renamed ${who} (${before.email}) to ${change.name}.`,
        detail: { from: before.name, to: change.name },
      });
    if (change.role !== undefined && change.role !== before.role)
      await recordAdminChange(tx, actor, {
        kind: 'role-changed',
        subjectId: id,
        summary: `Changed ${who}'s role from ${roleLabels[before.role]} to ${roleLabels[change.role]}.`,
        detail: { from: before.role, to: change.role },
      });
    if (change.disabled !== undefined && change.disabled !== before.disabled)
      await recordAdminChange(tx, actor, {
        kind: change.disabled ? 'sign-in-turned-off' : 'sign-in-turned-on',
        subjectId: id,
        summary: change.disabled
          ? `Turned off ${who}'s sign-in (${before.email}).`
          : `Turned ${who}'s sign-in back on (${before.email}).`,
      });
    return updated;
  });
}

/**
 * Admins can add people before their first sign-in, so they arrive with the right role. An e-mail already in use
 * is refused: the person behind it is changed only from the list, where the admin sees who they are changing.
 */
export async function inviteUser(db: Db, actor: SessionUser, input: { email: string; name: string; role: Role }) {
  const email = input.email.trim().toLowerCase();
  const [existing] = await db
    .select({ name: users.name, role: users.role })
    .from(users)
    .where(sql`lower(${users.email}) = ${email}`);
  if (existing) {
    const who = `${existing.name} (${roleLabels[existing.role]})`;
    throw conflict(`E-mail: ${email} already belongs to ${who}. Change their role in the list of people instead.`, {
      email: `already belongs to ${who}`,
    });
  }
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(users)
      .values({ ...input, email })
      .returning({ ...publicColumns, disabled: users.disabled });
    await recordAdminChange(tx, actor, {
      kind: 'person-added',
      subjectId: row.id,
      summary: `Added ${row.name} (${row.email}) as ${roleLabels[row.role]}.`,
    });
    return row;
  });
}
