import { NavLink, Outlet } from 'react-router';
import { roleLabels, type Role } from '@shared/workflow/statuses';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useSignOut } from '@/features/auth/api/sign-out';
import { OutboxPanel } from '@/features/jobs/components/outbox-panel';
import { NewVersionBanner } from './new-version-banner';
import { Logo } from './logo';

const navByRole: Record<Role, { to: string; label: string }[]> = {
  applicant: [
    { to: paths.applicant.requests.getHref(), label: 'My requests' },
    { to: paths.applicant.newRequest.getHref(), label: 'New request' },
  ],
  staff: [
    { to: paths.office.queue.getHref(), label: 'Queue' },
    { to: paths.office.calendar.getHref(), label: 'Calendar' },
    { to: paths.office.ruleProfiles.getHref(), label: 'Rule profiles' },
    { to: paths.office.rateCard.getHref(), label: 'Rate card' },
    { to: paths.office.payments.getHref(), label: 'Payments' },
    { to: paths.office.emails.getHref(), label: 'E-mail log' },
  ],
  crew: [
    { to: paths.crew.board.getHref(), label: 'Released jobs' },
    { to: paths.crew.myJobs.getHref(), label: 'My jobs' },
  ],
  admin: [
    { to: paths.office.queue.getHref(), label: 'Queue' },
    { to: paths.office.calendar.getHref(), label: 'Calendar' },
    { to: paths.office.ruleProfiles.getHref(), label: 'Rule profiles' },
    { to: paths.office.rateCard.getHref(), label: 'Rate card' },
    { to: paths.office.payments.getHref(), label: 'Payments' },
    { to: paths.office.emails.getHref(), label: 'E-mail log' },
    { to: paths.office.users.getHref(), label: 'Users and roles' },
    { to: paths.office.crewYard.getHref(), label: 'Crew yard' },
    { to: paths.office.audit.getHref(), label: 'Changes log' },
  ],
};

export function AppShell() {
  const me = useMe().data;
  const signOut = useSignOut();
  const links = me ? navByRole[me.role] : [];
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2"
      >
        Skip to content
      </a>
      <header className="no-print border-b-4 border-tape bg-pine-800 text-white">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Logo />
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {links.map((link) => (
              <NavLink
                key={link.to}
                to={link.to}
                end={false}
                className={({ isActive }) =>
                  `rounded px-3 py-1.5 text-sm font-semibold ${isActive ? 'bg-pine-900 text-tape' : 'text-pine-100 hover:bg-pine-700'}`
                }
              >
                {link.label}
              </NavLink>
            ))}
          </nav>
          {me ? (
            <div className="flex items-center gap-3 text-sm">
              <span>
                <span className="font-semibold">{me.name}</span>{' '}
                <span className="text-pine-200">· {roleLabels[me.role]}</span>
              </span>
              <button
                type="button"
                onClick={() => signOut.mutate()}
                className="rounded border border-pine-500 px-3 py-1 hover:bg-pine-700"
              >
                Sign out
              </button>
            </div>
          ) : (
            <NavLink
              to={paths.signIn.getHref()}
              className="rounded bg-tape px-3 py-1.5 text-sm font-semibold text-pine-900"
            >
              Sign in
            </NavLink>
          )}
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        <NewVersionBanner />
        {me?.role === 'crew' && <OutboxPanel userId={me.id} />}
        <Outlet />
      </main>
      <footer className="no-print border-t border-stone-200 py-4 text-center text-xs text-stone-600">
        Gradepass supports, and never replaces, the road authority’s review, local codes and a licensed engineer where
        one is required.
      </footer>
    </div>
  );
}
