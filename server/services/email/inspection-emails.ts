import { sharedPaths } from '@shared/paths';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';
import type { Person } from './transition-emails';

interface RequestFacts {
  id: string;
  reference: string;
  siteAddress: string;
}

const inspectorFooter =
  'You receive this because the contractor’s office sent you an inspection link in Gradepass. Reply to reach the office.';

const dayOf = (at: Date) =>
  at.toLocaleDateString('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone: 'UTC' });

/** The inspector's e-mail: the link, how long it works, and that it opens this one entrance only. */
export function inspectorLinkEmail(input: {
  request: RequestFacts;
  link: { inspectorName: string; inspectorEmail: string; expiresAt: Date };
  url: string;
  officeEmail: string;
}): OutgoingEmail {
  const content: EmailContent = {
    greeting: `Hello ${input.link.inspectorName},`,
    paragraphs: [
      `The driveway entrance at ${input.request.siteAddress} (our reference ${input.request.reference}) is built and ready for your inspection.`,
      'The link below opens a page with the permit and its conditions, the grade check, the crew’s finished-grade readings checked against the approved profile, and the crew’s photos. No account is needed. You can record the outcome on the same page: passed, or failed with the items to fix.',
      `The link works until ${dayOf(input.link.expiresAt)} and opens this entrance only. Please do not forward it. Questions: ${input.officeEmail}.`,
    ],
    link: { href: input.url, label: 'Open the inspection page' },
  };
  return {
    to: input.link.inspectorEmail,
    template: 'inspection.link',
    subject: `Inspection ready: driveway entrance at ${input.request.siteAddress}`,
    requestId: input.request.id,
    text: renderText(content, inspectorFooter),
    html: renderHtml(content, inspectorFooter),
  };
}

/** A passed inspection: the owner hears the good news, the office that it may close the request. */
export function inspectionPassedEmails(input: {
  request: RequestFacts;
  applicant: Person;
  officeEmail: string;
  inspectorName: string;
  note: string;
  appOrigin: string;
}): OutgoingEmail[] {
  const noteLine = input.note ? [`The inspector’s note: ${input.note}`] : [];
  const owner: EmailContent = {
    greeting: `Hello ${input.applicant.name},`,
    paragraphs: [
      `The road authority’s inspector, ${input.inspectorName}, has passed your new driveway entrance at ${input.request.siteAddress}.`,
      ...noteLine,
      'The office will close the request shortly.',
    ],
    link: { href: input.appOrigin + sharedPaths.applicantRequest.getHref(input.request.id), label: 'See your request' },
  };
  const office: EmailContent = {
    greeting: 'Hello office,',
    paragraphs: [
      `${input.inspectorName} recorded a passed inspection for ${input.request.reference} (${input.request.siteAddress}).`,
      ...noteLine,
      'The request can now be closed.',
    ],
    link: {
      href: input.appOrigin + sharedPaths.officeRequest.getHref(input.request.id),
      label: 'Open it in Gradepass',
    },
  };
  const build = (to: string, c: EmailContent, subject: string): OutgoingEmail => ({
    to,
    template: 'inspection.passed',
    subject,
    requestId: input.request.id,
    text: renderText(c, requestFooter),
    html: renderHtml(c, requestFooter),
  });
  return [
    build(input.applicant.email, owner, `${input.request.reference}: your entrance passed inspection`),
    build(input.officeEmail, office, `[${input.request.reference}] Inspection passed`),
  ];
}
