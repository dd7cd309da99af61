import { sharedPaths } from '@shared/paths';
import { statusText } from '@shared/workflow/statuses';
import type { Transition } from '@shared/workflow/transitions';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';

export interface Person {
  email: string;
  name: string;
}

/** Who a status change's e-mail can go to. */
export type Audience = 'applicant' | 'office' | 'crew' | 'crewLeads';

export interface TransitionEmailInput {
  transition: Transition;
  /** Who hears about the change, as the action's definition says. */
  audiences: readonly Audience[];
  /** Who reads the note; left out, everyone told does. */
  noteTo?: readonly Audience[];
  ownerNoteLead?: string;
  ownerReceipt?: boolean;
  request: { id: string; reference: string; siteAddress: string };
  note: string;
  applicant: Person;
  officeEmail: string;
  crew?: Person | null;
  /** All crew leads, told when a job reaches the board. */
  crewLeads?: Person[];
  appOrigin: string;
  /** Words a later step adds, such as the grade check's summary or the visit date. */
  detail?: string;
}

const noteFor = (input: TransitionEmailInput, audience: Audience) =>
  !input.noteTo || input.noteTo.includes(audience) ? input.note : '';

function applicantContent(input: TransitionEmailInput): EmailContent {
  const { transition, request, detail } = input;
  const note = noteFor(input, 'applicant');
  const to = statusText[transition.to];
  const first = input.ownerReceipt
    ? `Thank you: we have your request ${request.reference} for a driveway entrance at ${request.siteAddress}.`
    : `Your request ${request.reference} for ${request.siteAddress} is now: ${to.label}.`;
  const paragraphs = [first];
  if (detail) paragraphs.push(detail);
  if (note) paragraphs.push(`${input.ownerNoteLead ?? 'Note from the office:'} ${note}`);
  paragraphs.push(`What happens next: ${to.next}`);
  return {
    greeting: `Hello ${input.applicant.name},`,
    paragraphs,
    link: { href: input.appOrigin + sharedPaths.applicantRequest.getHref(request.id), label: 'See your request' },
  };
}

function teamContent(input: TransitionEmailInput, audience: Audience, who: string, href: string): EmailContent {
  const { transition, request, detail } = input;
  const note = noteFor(input, audience);
  const paragraphs = [
    `${request.reference} (${request.siteAddress}) moved from "${statusText[transition.from].label}" to "${statusText[transition.to].label}".`,
  ];
  if (detail) paragraphs.push(detail);
  if (note) paragraphs.push(`Note: ${note}`);
  return { greeting: `Hello ${who},`, paragraphs, link: { href, label: 'Open it in Gradepass' } };
}

export function emailsForTransition(input: TransitionEmailInput): OutgoingEmail[] {
  const { transition, request } = input;
  const label = statusText[transition.to].label;
  const build = (to: string, content: EmailContent, subject: string): OutgoingEmail => ({
    to,
    template: `transition.${transition.action}`,
    subject,
    requestId: request.id,
    text: renderText(content, requestFooter),
    html: renderHtml(content, requestFooter),
  });
  const officeHref = input.appOrigin + sharedPaths.officeRequest.getHref(request.id);
  const crewHref = input.appOrigin + sharedPaths.crewBoard.getHref();
  const out: OutgoingEmail[] = [];
  for (const audience of input.audiences) {
    if (audience === 'applicant') {
      const subject = input.ownerReceipt
        ? `We received your request ${request.reference}`
        : `${request.reference}: ${label}`;
      out.push(build(input.applicant.email, applicantContent(input), subject));
    } else if (audience === 'office') {
      out.push(
        build(input.officeEmail, teamContent(input, 'office', 'office', officeHref), `[${request.reference}] ${label}`),
      );
    } else if (audience === 'crew' && input.crew) {
      out.push(
        build(
          input.crew.email,
          teamContent(input, 'crew', input.crew.name, crewHref),
          `[${request.reference}] ${label}`,
        ),
      );
    } else if (audience === 'crewLeads') {
      for (const lead of input.crewLeads ?? []) {
        out.push(
          build(
            lead.email,
            teamContent(input, 'crewLeads', lead.name, crewHref),
            `New job on the board: ${request.reference}`,
          ),
        );
      }
    }
  }
  return out;
}
