import { sharedPaths } from '@shared/paths';
import { isOfficeRole, type Role } from '@shared/workflow/statuses';
import { renderHtml, renderText, requestFooter, type EmailContent } from './layout';
import type { OutgoingEmail } from './outbox';
import type { Person } from './transition-emails';

export interface MessageEmailInput {
  request: { id: string; reference: string; siteAddress: string };
  author: { id: string; name: string; role: Role };
  body: string;
  visibility: 'internal' | 'shared';
  applicant: Person & { id: string };
  /** The crew lead holding the job, if any. */
  crew: (Person & { id: string }) | null;
  officeEmail: string;
  appOrigin: string;
}

const roleWords: Record<Role, string> = {
  applicant: 'the homeowner',
  staff: 'the office',
  admin: 'the office',
  crew: 'the crew',
};

/**
 * Who hears about a new message. Internal notes stay in the office, so they e-mail nobody. A shared message reaches
 * everyone on the request who did not write it: the homeowner, the office inbox and the crew lead holding the
 * job (the crew sees shared messages only for jobs it holds).
 */
export function messageEmails(input: MessageEmailInput): OutgoingEmail[] {
  if (input.visibility === 'internal') return [];
  const { request, author } = input;
  const intro = `${author.name} (${roleWords[author.role]}) wrote about ${request.reference}, the driveway entrance at ${request.siteAddress}:`;
  const build = (to: string, greeting: string, href: string, subject: string): OutgoingEmail => {
    const content: EmailContent = {
      greeting,
      paragraphs: [intro, `“${input.body}”`],
      link: { href, label: 'Read and answer in Gradepass' },
    };
    return {
      to,
      template: 'message.shared',
      subject,
      requestId: request.id,
      text: renderText(content, requestFooter),
      html: renderHtml(content, requestFooter),
    };
  };
  const out: OutgoingEmail[] = [];
  if (author.id !== input.applicant.id) {
    out.push(
      build(
        input.applicant.email,
        `Hello ${input.applicant.name},`,
        input.appOrigin + sharedPaths.applicantRequest.getHref(request.id),
        `${request.reference}: a message from ${roleWords[author.role]}`,
      ),
    );
  }
  if (!isOfficeRole(author.role)) {
    out.push(
      build(
        input.officeEmail,
        'Hello office,',
        input.appOrigin + sharedPaths.officeRequest.getHref(request.id),
        `[${request.reference}] Message from ${author.name}`,
      ),
    );
  }
  if (input.crew && author.id !== input.crew.id) {
    out.push(
      build(
        input.crew.email,
        `Hello ${input.crew.name},`,
        input.appOrigin + sharedPaths.crewFieldSheet.getHref(request.id),
        `[${request.reference}] Message from ${author.name}`,
      ),
    );
  }
  return out;
}
