import type { ReactNode } from 'react';
import { can, type Permission } from '../../shared/auth/permissions';
import { useUser } from '@/lib/auth';

// Hides what the server would refuse; the server still checks every request.
export function Can({ permission, children, fallback = null }: { permission: Permission; children: ReactNode; fallback?: ReactNode }) {
  const { data: user } = useUser();
  return <>{can(user?.role, permission) ? children : fallback}</>;
}
