import { Navigate, useSearchParams } from 'react-router';
import { roleHome } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { Loading, Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';

export function Component() {
  const [search] = useSearchParams();
  const { data: me, isPending } = useMe();
  const error = search.get('error');
  const next = search.get('next');
  const safeNext = next && next.startsWith('/') && !next.startsWith('//') ? next : null;
  if (isPending) return <Loading />;
  if (me) return <Navigate to={safeNext ?? roleHome(me.role)} replace />;
  return (
    <div className="mx-auto max-w-md py-10">
      <Panel title="Sign in to Gradepass">
        <p className="mb-4 text-stone-700">
          Use your Google account. If this is your first time, we create your account as a homeowner; the office gives
          staff and crew their access.
        </p>
        {error && (
          <div className="mb-4">
            <Notice tone="error" title="Sign-in did not finish">
              {error}
            </Notice>
          </div>
        )}
        {/* A full page load, not a fetch: the sign-in provider takes over the window. */}
        <a
          href="/auth/google"
          className="block w-full rounded-md bg-pine-700 px-4 py-3 text-center font-semibold text-white hover:bg-pine-800"
        >
          Sign in with Google
        </a>
      </Panel>
    </div>
  );
}
