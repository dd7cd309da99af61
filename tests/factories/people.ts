import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Role } from '@shared/workflow/statuses';
import type { DbOrTx } from '../../server/db/client';
import { users } from '../../server/db/schema';

export type UserRow = typeof users.$inferSelect;

/** A person with a unique e-mail; pass `email` to match an identity the OAuth stand-in knows. */
export async function createPerson(
  db: DbOrTx,
  overrides: Partial<typeof users.$inferInsert> & { role?: Role } = {},
): Promise<UserRow> {
  const tag = randomUUID().slice(0, 8);
  const [row] = await db
    .insert(users)
    .values({
      email: `person-${tag}@example.test`,
      name: `Person ${tag}`,
      role: 'applicant',
      ...overrides,
    })
    .returning();
  return row;
}

/** The demo people the stand-in can sign in, created on demand in a test database. */
export async function ensurePerson(db: DbOrTx, person: { email: string; name: string; role: Role }): Promise<UserRow> {
  const [found] = await db.select().from(users).where(eq(users.email, person.email));
  return found ?? createPerson(db, person);
}
