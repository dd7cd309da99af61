import { createBrowserRouter } from 'react-router';
import { paths } from '@/config/paths';
import { AppShell } from '@/app/layout/app-shell';
import { Loading } from '@/components/ui/notice';
import { RouteError } from './routes/route-error';

const page = (load: () => Promise<{ Component: React.ComponentType }>) => ({ lazy: load });

/** One route table; each screen is its own lazily loaded module. */
export function createAppRouter() {
  return createBrowserRouter([
    // The inspector has no account: the page stands outside the signed-in shell.
    { path: paths.inspectorPage.path, errorElement: <RouteError />, ...page(() => import('./routes/inspect')) },
    {
      element: <AppShell />,
      errorElement: <RouteError />,
      // Shown while the first screen's module loads, so the router has something to draw (and says nothing on the console).
      hydrateFallbackElement: <Loading label="Opening Gradepass…" />,
      children: [
        { path: paths.home.path, ...page(() => import('./routes/landing')) },
        { path: paths.signIn.path, ...page(() => import('./routes/sign-in')) },
        { path: paths.applicant.requests.path, ...page(() => import('./routes/applicant/my-requests')) },
        { path: paths.applicant.newRequest.path, ...page(() => import('./routes/applicant/new-request')) },
        { path: paths.applicant.editRequest.path, ...page(() => import('./routes/applicant/edit-request')) },
        { path: paths.applicant.request.path, ...page(() => import('./routes/applicant/request')) },
        { path: paths.office.queue.path, ...page(() => import('./routes/office/queue')) },
        { path: paths.office.request.path, ...page(() => import('./routes/office/request')) },
        { path: paths.office.gradeCheck.path, ...page(() => import('./routes/office/grade-check')) },
        { path: paths.office.ruleProfiles.path, ...page(() => import('./routes/office/rule-profiles')) },
        { path: paths.office.ruleProfile.path, ...page(() => import('./routes/office/rule-profile')) },
        { path: paths.office.rateCard.path, ...page(() => import('./routes/office/rate-card')) },
        { path: paths.office.emails.path, ...page(() => import('./routes/office/emails')) },
        { path: paths.office.calendar.path, ...page(() => import('./routes/office/calendar')) },
        { path: paths.office.payments.path, ...page(() => import('./routes/office/payments')) },
        { path: paths.office.users.path, ...page(() => import('./routes/office/users')) },
        { path: paths.office.audit.path, ...page(() => import('./routes/office/changes')) },
        { path: paths.office.crewYard.path, ...page(() => import('./routes/office/crew-yard')) },
        { path: paths.crew.board.path, ...page(() => import('./routes/crew/board')) },
        { path: paths.crew.myJobs.path, ...page(() => import('./routes/crew/my-jobs')) },
        { path: paths.crew.fieldSheet.path, ...page(() => import('./routes/crew/field-sheet')) },
        { path: paths.crew.asBuilt.path, ...page(() => import('./routes/crew/as-built')) },
        { path: '*', ...page(() => import('./routes/not-found')) },
      ],
    },
  ]);
}
