import { demoPeople } from '../../server/dev/seed/demo-people';
import type { Role } from '@shared/workflow/statuses';
import { afterAll, beforeAll } from 'vitest';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';
import { ensurePerson } from './people';

export type Agent = Awaited<ReturnType<typeof signIn>>;
export interface SignedIn {
  agent: Agent;
  id: string;
  email: string;
  role: Role;
}

/**
 * Adds the demo people (only the people: the demo requests would skew counts) and signs in the first of each role,
 * plus a second office person and owner.
 */
export async function signInCast(t: TestApp) {
  for (const person of demoPeople) await ensurePerson(t.ctx.db, person);
  const as = async (email: string): Promise<SignedIn> => {
    const agent = await signIn(t.app, email);
    const me = await agent.get('/api/me').expect(200);
    return { agent, id: me.body.user.id, email, role: me.body.user.role };
  };
  const first = (role: Role, skip = 0) => demoPeople.filter((p) => p.role === role)[skip].email;
  return {
    applicant: await as(first('applicant')),
    otherApplicant: await as(first('applicant', 1)),
    staff: await as(first('staff')),
    otherStaff: await as(first('staff', 1)),
    crew: await as(first('crew')),
    admin: await as(first('admin')),
  };
}
export type Cast = Awaited<ReturnType<typeof signInCast>>;

/**
 * The set-up most office and crew test files share: one app and database for the file, with the cast signed in.
 * Registers the hooks; `use` receives both once they are ready.
 */
export function withCastApp(use: (app: TestApp, cast: Cast) => void) {
  let app: TestApp | undefined;
  beforeAll(async () => {
    app = await createTestApp();
    use(app, await signInCast(app));
  });
  afterAll(() => app?.close());
}
