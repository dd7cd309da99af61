import { sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { users } from '../../db/schema';
import { demoPeople } from './demo-people';
import { seedDemoInspection } from './demo-inspection';
import { seedDemoJobs } from './demo-jobs';
import { seedDemoQuotes } from './demo-quotes';
import { seedDemoRequests } from './demo-requests';
import { seedJurisdictions } from './jurisdictions';

/** Seeds the demo scenario; safe to run on every start (existing rows are left as they are). */
export async function seedDemo(db: Db) {
  await db.transaction(async (tx) => {
    for (const person of demoPeople) {
      const [found] = await tx
        .select({ id: users.id })
        .from(users)
        .where(sql`lower(${users.email}) = ${person.email}`);
      if (!found) await tx.insert(users).values(person);
    }
    await seedJurisdictions(tx);
    await seedDemoRequests(tx);
    await seedDemoQuotes(tx);
    await seedDemoInspection(tx);
  });
  await seedDemoJobs(db);
}
