import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { requests } from '../../server/db/schema';
import { canSee } from '../../server/services/requests/request-access';
import { requestStatuses, statusText, type RequestStatus, type Role } from '@shared/workflow/statuses';
import { formFieldsOf } from '@shared/workflow/transition-inputs';
import { transitions, type Transition, type TransitionAction } from '@shared/workflow/transitions';
import { createAsBuiltSet, createGradeCheck } from '../factories/grade-checks';
import { type Cast, type SignedIn, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

const crewStatuses: RequestStatus[] = ['crew_assigned', 'under_construction', 'built', 'closed'];

/** A request sitting in `status` with whatever a move out of it would need already in place. */
async function requestIn(status: RequestStatus) {
  const db = t.ctx.db;
  const row = await createRequestRow(db, {
    applicantId: cast.applicant.id,
    status,
    permitReference: 'FC-ACC-2291',
    crewId: crewStatuses.includes(status) ? cast.crew.id : null,
  });
  const check = await createGradeCheck(db, { requestId: row.id, createdById: cast.staff.id });
  await createAsBuiltSet(db, { requestId: row.id, gradeCheckId: check.id, crewId: cast.crew.id });
  return row;
}

/** A body with every field the action's shared input requires, and nothing else. */
const sample: Record<string, string> = {
  note: 'Culvert cover is under 12 in at the ditch line.',
  answer: 'The ditch is about 2 ft deep at the mailbox.',
  visitAt: new Date(Date.now() + 3 * 86_400_000).toISOString(),
  permitDecidedOn: '2026-04-02',
  permitReference: 'FC-ACC-2291',
  inspectorName: 'Imani Voss',
  items: 'Reseed both ditch slopes',
};
function bodyFor(action: TransitionAction, version: number) {
  const body: Record<string, unknown> = { action, expectedVersion: version };
  for (const field of formFieldsOf(action)) if (field.required) body[field.name] = sample[field.name];
  return body;
}

const people = (): Record<Role, SignedIn> => ({
  applicant: cast.applicant,
  staff: cast.staff,
  crew: cast.crew,
  admin: cast.admin,
});
const cases = transitions.flatMap((tr) =>
  (['applicant', 'staff', 'crew', 'admin'] as const).map((role) => ({ tr, role })),
);

describe('every transition in the table, for every role', () => {
  it.each(cases.map(({ tr, role }) => [`${tr.action} from ${tr.from} as ${role}`, tr, role] as const))(
    '%s',
    async (_name, tr: Transition, role: Role) => {
      const row = await requestIn(tr.from);
      const who = people()[role];
      const res = await who.agent.post(`/api/requests/${row.id}/transitions`).send(bodyFor(tr.action, row.version));
      const [after] = await t.ctx.db.select().from(requests).where(eq(requests.id, row.id));
      if (tr.roles.includes(role)) {
        expect(res.status, JSON.stringify(res.body)).toBe(200);
        expect(res.body.request).toMatchObject({ status: tr.to, version: row.version + 1 });
        expect(after.status).toBe(tr.to);
        if (tr.action === 'accept-job') expect(after.crewId).toBe(who.id);
      } else {
        // Whoever may not even see the request gets 404; the rest get 409 naming where it stands.
        const visible = canSee({ id: who.id, email: who.email, name: '', role }, row);
        expect(res.status, JSON.stringify(res.body)).toBe(visible ? 409 : 404);
        // In the words the screens use, never the status's code.
        if (visible) expect(res.body.error.message).toContain(`"${statusText[tr.from].label}"`);
        if (visible) expect(res.body.error.message).not.toContain(tr.from);
        expect(after).toMatchObject({ status: tr.from, version: row.version });
      }
    },
  );
});

describe('actions that are not in the table', () => {
  const pairs = requestStatuses.flatMap((from) =>
    [...new Set(transitions.map((x) => x.action))]
      .filter((action) => !transitions.some((x) => x.from === from && x.action === action))
      .map((action) => [from, action] as const),
  );

  it.each(pairs)('%s cannot %s, even for the owner (admin)', async (from, action) => {
    const row = await requestIn(from);
    const res = await cast.admin.agent.post(`/api/requests/${row.id}/transitions`).send(bodyFor(action, row.version));
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain(`"${statusText[from].label}"`);
    expect(res.body.error.message).not.toContain(`(${from})`);
    const [after] = await t.ctx.db
      .select({ status: requests.status, version: requests.version })
      .from(requests)
      .where(eq(requests.id, row.id));
    expect(after).toEqual({ status: from, version: row.version });
  });
});
