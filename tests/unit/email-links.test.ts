import { matchPath } from 'react-router';
import { describe, expect, it } from 'vitest';
import { messageEmails } from '../../server/services/email/message-emails';
import type { OutgoingEmail } from '../../server/services/email/outbox';
import { scheduleEmails } from '../../server/services/email/schedule-emails';
import { emailsForTransition } from '../../server/services/email/transition-emails';
import { actionDefs } from '../../server/services/transitions/registry';
import { transitions, type TransitionAction } from '@shared/workflow/transitions';
import { paths } from '../../src/config/paths';

const appOrigin = 'https://gradepass.example.test';
const request = {
  id: '6f1c2b9e-8d3a-4f0e-9b7c-2a5d8e1f4c3b',
  reference: 'GP-2026-00042',
  siteAddress: '14 Heron Bend Lane',
};
const applicant = { id: 'a1', email: 'owner@example.test', name: 'Ada Quill' };
const crew = { id: 'c1', email: 'crew@example.test', name: 'Bram Osei' };
const officeEmail = 'office@example.test';

/** The path each e-mail's link points at, read from the plain-text body as the reader sees it. */
function linkPaths(emails: OutgoingEmail[]) {
  return Object.fromEntries(
    emails.map((e) => {
      const href = e.text.match(new RegExp(`${appOrigin}\\S*`))?.[0];
      expect(href, `a link in the e-mail to ${e.to}`).toBeDefined();
      return [e.to, new URL(href!).pathname];
    }),
  );
}

/** A link is right when the client's route for that screen matches it, with the request's id where it has one. */
function expectRoute(pathname: string, route: { path: string }, id?: string) {
  const match = matchPath(route.path, pathname);
  expect(match, `${pathname} opens ${route.path}`).not.toBeNull();
  if (id) expect(match!.params.id).toBe(id);
}

const transition = (action: TransitionAction) => transitions.find((t) => t.action === action)!;
// Who hears of a change, as the action's own entry on the server says.
const told = (action: TransitionAction) => ({
  transition: transition(action),
  audiences: actionDefs[action].emails.to,
  noteTo: actionDefs[action].emails.noteTo,
});

describe('every e-mail link opens the client screen it names', () => {
  it('status changes link the owner, the office and the crew leads to their own screens', () => {
    const built = linkPaths(
      emailsForTransition({ ...told('mark-built'), request, note: '', applicant, officeEmail, appOrigin }),
    );
    expectRoute(built[applicant.email], paths.applicant.request, request.id);
    expectRoute(built[officeEmail], paths.office.request, request.id);
    const released = linkPaths(
      emailsForTransition({
        ...told('release'),
        request,
        note: '',
        applicant,
        officeEmail,
        crewLeads: [crew],
        appOrigin,
      }),
    );
    expectRoute(released[crew.email], paths.crew.board);
  });

  it('messages link the owner, the office and the crew lead holding the job', () => {
    const fromCrew = linkPaths(
      messageEmails({
        request,
        author: { ...crew, role: 'crew' },
        body: 'Pouring Tuesday',
        visibility: 'shared',
        applicant,
        crew,
        officeEmail,
        appOrigin,
      }),
    );
    expectRoute(fromCrew[applicant.email], paths.applicant.request, request.id);
    expectRoute(fromCrew[officeEmail], paths.office.request, request.id);
    const fromOwner = linkPaths(
      messageEmails({
        request,
        author: { ...applicant, role: 'applicant' },
        body: 'Gate code 4411',
        visibility: 'shared',
        applicant,
        crew,
        officeEmail,
        appOrigin,
      }),
    );
    expectRoute(fromOwner[crew.email], paths.crew.fieldSheet, request.id);
  });

  it('the build day links the owner and the office', () => {
    const day = linkPaths(
      scheduleEmails({
        request,
        applicant,
        crew,
        officeEmail,
        date: '2026-12-08',
        previousDate: null,
        note: '',
        appOrigin,
      }),
    );
    expectRoute(day[applicant.email], paths.applicant.request, request.id);
    expectRoute(day[officeEmail], paths.office.request, request.id);
  });
});
