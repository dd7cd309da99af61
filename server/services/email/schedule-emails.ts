import { formatDay } from '@shared/format/dates';
import { sharedPaths } from '@shared/paths';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';
import type { Person } from './transition-emails';

export interface ScheduleEmailInput {
  request: { id: string; reference: string; siteAddress: string };
  applicant: Person;
  crew: Person;
  officeEmail: string;
  /** The day as the crew picked it, YYYY-MM-DD. */
  date: string;
  previousDate: string | null;
  note: string;
  appOrigin: string;
}

/** "Tue, Dec 8, 2026": the day as every screen and document writes it, fixed to the date itself. */
export const dayInWords = (isoDate: string): string => formatDay(isoDate, { weekday: true });

/** The homeowner hears the day the crew plans to build, and again whenever it moves; the office is copied. */
export function scheduleEmails(input: ScheduleEmailInput): OutgoingEmail[] {
  const day = dayInWords(input.date);
  const moved = input.previousDate && input.previousDate !== input.date;
  const paragraphs = [
    moved
      ? `The crew has moved the work on your driveway entrance at ${input.request.siteAddress} from ${dayInWords(input.previousDate!)} to ${day}.`
      : `The crew plans to build your driveway entrance at ${input.request.siteAddress} on ${day}.`,
    `Crew lead: ${input.crew.name}. Please keep the entrance area clear of vehicles that day. Work in the road's right-of-way follows the road authority's traffic control rules, so there may be cones and a flagger on the road.`,
  ];
  if (input.note) paragraphs.push(`Note from the crew: ${input.note}`);
  paragraphs.push('Weather can move the day; if it does, you will get another e-mail.');
  const content: EmailContent = {
    greeting: `Hello ${input.applicant.name},`,
    paragraphs,
    link: { href: input.appOrigin + sharedPaths.applicantRequest.getHref(input.request.id), label: 'See your request' },
  };
  const subject = `${input.request.reference}: work planned for ${day}`;
  const officeContent: EmailContent = {
    greeting: 'Hello office,',
    paragraphs: [
      `${input.crew.name} planned ${input.request.reference} (${input.request.siteAddress}) for ${day}.`,
      ...(input.note ? [`Note: ${input.note}`] : []),
    ],
    link: {
      href: input.appOrigin + sharedPaths.officeRequest.getHref(input.request.id),
      label: 'Open it in Gradepass',
    },
  };
  const build = (to: string, c: EmailContent, s: string): OutgoingEmail => ({
    to,
    template: 'crew.schedule',
    subject: s,
    requestId: input.request.id,
    text: renderText(c, requestFooter),
    html: renderHtml(c, requestFooter),
  });
  return [
    build(input.applicant.email, content, subject),
    build(input.officeEmail, officeContent, `[${input.request.reference}] Work planned for ${day}`),
  ];
}
