import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import type { Role } from '@shared/workflow/statuses';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { Loading, Notice } from '@/components/ui/notice';

/** The client only hides what the server refuses anyway; this keeps people out of screens that would fail. */
export function RequireRole({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const { data: me, isPending } = useMe();
  const location = useLocation();
  if (isPending) return <Loading />;
  if (!me) return <Navigate to={`${paths.signIn.getHref()}?next=${encodeURIComponent(location.pathname)}`} replace />;
  if (!roles.includes(me.role)) {
    return (
      <Notice tone="warn" title="This page is not for your role">
        Use the menu above to find your own pages.
      </Notice>
    );
  }
  return <>{children}</>;
}
