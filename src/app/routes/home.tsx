import { Navigate } from 'react-router-dom';
import { ROLE_HOME } from '../../../shared/auth/permissions';
import { paths } from '@/config/paths';
import { useUser } from '@/lib/auth';
import { Spinner } from '@/components/ui/status';

export function HomeRoute() {
  const { data: user, isPending } = useUser();
  if (isPending) return <Spinner />;
  return <Navigate to={user ? ROLE_HOME[user.role] : paths.login} replace />;
}
