import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { can, type Permission } from '../../../shared/auth/permissions';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { useUser } from '@/lib/auth';

export function RequireUser({ permission, children }: { permission?: Permission; children: ReactNode }) {
  const { data: user, isPending, error } = useUser();
  const location = useLocation();
  if (isPending) return <Spinner label="Checking your sign-in…" />;
  if (error) return <ErrorMessage error={error} />;
  if (!user) return <Navigate to={`${paths.login}?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  if (permission && !can(user.role, permission)) {
    return (
      <Page title="Not available to your role">
        <p className="text-sm text-muted">Your role does not include this page. Ask an admin if you need it.</p>
      </Page>
    );
  }
  return <>{children}</>;
}
