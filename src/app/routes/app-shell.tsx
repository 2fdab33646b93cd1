import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { can, ROLE_LABELS, type Permission } from '../../../shared/auth/permissions';
import { paths } from '@/config/paths';
import { useUser } from '@/lib/auth';
import { useLogout } from '@/features/auth/api/logout';

const NAV: { to: string; label: string; permission: Permission }[] = [
  { to: paths.scenarios, label: 'Scenarios', permission: 'scenarios:read' },
  { to: paths.compare, label: 'Side by side', permission: 'scenarios:read' },
  { to: paths.places, label: 'Workstations', permission: 'scenarios:read' },
  { to: paths.agents, label: 'Dust agents', permission: 'scenarios:read' },
  { to: paths.sizeProfiles, label: 'Size profiles', permission: 'scenarios:read' },
  { to: paths.particleCalculator, label: 'Particle calculator', permission: 'calculators:use' },
  { to: paths.hoodCalculator, label: 'Hood calculator', permission: 'calculators:use' },
  { to: paths.station, label: 'Your station', permission: 'boards:read-own' },
  { to: paths.audit, label: 'Audit trail', permission: 'audit:read' },
  { to: paths.people, label: 'People', permission: 'people:manage' },
  { to: paths.outbox, label: 'Outbox', permission: 'outbox:read' },
];

export function AppShell() {
  const user = useUser().data;
  const logout = useLogout();
  const navigate = useNavigate();
  const items = NAV.filter((n) => can(user?.role, n.permission));
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:p-2">
        Skip to content
      </a>
      <header className="border-b border-line bg-white print:hidden">
        <div className="mx-auto max-w-6xl px-4 sm:px-6">
          <div className="flex items-center justify-between gap-4 pt-3">
            <NavLink to={paths.home} className="flex items-center gap-2 text-lg font-bold text-ink">
              <span aria-hidden="true" className="inline-block h-3 w-3 rounded-full bg-accent" />
              Motewalk
            </NavLink>
            {user && (
              <div className="flex items-center gap-3 text-sm">
                <span>
                  {user.name} <span className="text-muted">· {ROLE_LABELS[user.role]}</span>
                </span>
                <button
                  type="button"
                  className="rounded-md px-2 py-1 font-semibold text-accent hover:bg-accent-soft"
                  onClick={() => logout.mutate(undefined, { onSettled: () => navigate(paths.login) })}
                >
                  Sign out
                </button>
              </div>
            )}
          </div>
          <nav aria-label="Main" className="-mx-2 flex flex-wrap gap-x-0.5 py-2">
            {items.map((n) => (
              <NavLink
                key={n.to}
                to={n.to}
                className={({ isActive }) =>
                  `rounded-md px-2 py-1.5 text-sm font-semibold ${isActive ? 'bg-accent-soft text-accent-strong' : 'text-muted hover:text-ink'}`
                }
              >
                {n.label}
              </NavLink>
            ))}
          </nav>
        </div>
      </header>
      <Outlet />
    </div>
  );
}
