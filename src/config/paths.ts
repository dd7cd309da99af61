import { sharedPaths } from '@shared/paths';
import type { Role } from '@shared/workflow/statuses';

/** Every client route, paired with the helper that builds a link to it. */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: { path: '/sign-in', getHref: () => '/sign-in' },
  applicant: {
    requests: { path: '/my/requests', getHref: () => '/my/requests' },
    newRequest: { path: '/my/requests/new', getHref: () => '/my/requests/new' },
    editRequest: { path: '/my/requests/:id/edit', getHref: (id: string) => `/my/requests/${id}/edit` },
    request: sharedPaths.applicantRequest,
  },
  office: {
    queue: { path: '/office/queue', getHref: (search = '') => `/office/queue${search}` },
    request: sharedPaths.officeRequest,
    gradeCheck: {
      path: '/office/requests/:id/grade-check',
      getHref: (id: string) => `/office/requests/${id}/grade-check`,
    },
    ruleProfiles: { path: '/office/rule-profiles', getHref: () => '/office/rule-profiles' },
    ruleProfile: { path: '/office/rule-profiles/:id', getHref: (id: string) => `/office/rule-profiles/${id}` },
    rateCard: { path: '/office/rate-card', getHref: () => '/office/rate-card' },
    emails: { path: '/office/emails', getHref: () => '/office/emails' },
    calendar: { path: '/office/calendar', getHref: () => '/office/calendar' },
    payments: { path: '/office/payments', getHref: () => '/office/payments' },
    users: { path: '/office/users', getHref: () => '/office/users' },
    audit: { path: '/office/changes', getHref: () => '/office/changes' },
    crewYard: { path: '/office/crew-yard', getHref: () => '/office/crew-yard' },
  },
  inspectorPage: sharedPaths.inspectorPage,
  crew: {
    board: sharedPaths.crewBoard,
    myJobs: { path: '/crew/my-jobs', getHref: () => '/crew/my-jobs' },
    fieldSheet: sharedPaths.crewFieldSheet,
    asBuilt: { path: '/crew/jobs/:id/as-built', getHref: (id: string) => `/crew/jobs/${id}/as-built` },
  },
} as const;

export function roleHome(role: Role): string {
  if (role === 'applicant') return paths.applicant.requests.getHref();
  if (role === 'crew') return paths.crew.board.getHref();
  return paths.office.queue.getHref();
}
