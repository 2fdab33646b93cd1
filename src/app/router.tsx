import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter } from 'react-router-dom';
import type { Permission } from '../../shared/auth/permissions';
import { paths } from '@/config/paths';
import { Spinner } from '@/components/ui/status';
import { AppShell } from './routes/app-shell';
import { HomeRoute } from './routes/home';
import { NotFoundRoute, RouteError } from './routes/not-found';
import { RequireUser } from './routes/require-user';
import { SetPasswordRoute } from './routes/set-password';
import { SignInRoute } from './routes/sign-in';

// Every page but sign-in loads on demand, so the first paint stays small.
const AuditRoute = lazy(() => import('./routes/audit').then((m) => ({ default: m.AuditRoute })));
const PlacesRoute = lazy(() => import('./routes/places').then((m) => ({ default: m.PlacesRoute })));
const RunRoute = lazy(() => import('./routes/run').then((m) => ({ default: m.RunRoute })));
const ScenarioRoute = lazy(() => import('./routes/scenario').then((m) => ({ default: m.ScenarioRoute })));
const WorkstationRoute = lazy(() => import('./routes/workstation').then((m) => ({ default: m.WorkstationRoute })));
const ScenariosRoute = lazy(() => import('./routes/scenarios').then((m) => ({ default: m.ScenariosRoute })));
const StationRoute = lazy(() => import('./routes/station').then((m) => ({ default: m.StationRoute })));
const PeoplePage = lazy(() => import('@/features/people/components/people-page').then((m) => ({ default: m.PeoplePage })));
const ParticleCalculatorPage = lazy(() =>
  import('@/features/calculators/components/particle-calculator-page').then((m) => ({ default: m.ParticleCalculatorPage })),
);
const HoodCalculatorPage = lazy(() =>
  import('@/features/calculators/components/hood-calculator-page').then((m) => ({ default: m.HoodCalculatorPage })),
);
const AgentsPage = lazy(() => import('@/features/agents/components/agents-page').then((m) => ({ default: m.AgentsPage })));
const SizeProfilesPage = lazy(() =>
  import('@/features/size-profiles/components/size-profiles-page').then((m) => ({ default: m.SizeProfilesPage })),
);
const SizeProfileDetailPage = lazy(() =>
  import('@/features/size-profiles/components/size-profile-detail').then((m) => ({ default: m.SizeProfileDetailPage })),
);
const SweepRoute = lazy(() => import('./routes/sweep').then((m) => ({ default: m.SweepRoute })));
const ReportRoute = lazy(() => import('./routes/report').then((m) => ({ default: m.ReportRoute })));
const CompareRoute = lazy(() => import('./routes/compare').then((m) => ({ default: m.CompareRoute })));
const EngineCheckPage = lazy(() =>
  import('@/features/engine-check/components/engine-check-page').then((m) => ({ default: m.EngineCheckPage })),
);
const OutboxPage = lazy(() => import('@/features/outbox/components/outbox-page').then((m) => ({ default: m.OutboxPage })));

const guarded = (permission: Permission | undefined, node: ReactNode) => (
  <RequireUser permission={permission}>
    <Suspense fallback={<Spinner />}>{node}</Suspense>
  </RequireUser>
);

export const router = createBrowserRouter([
  { path: paths.login, element: <SignInRoute />, errorElement: <RouteError /> },
  { path: paths.setPassword, element: <SetPasswordRoute />, errorElement: <RouteError /> },
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    children: [
      { path: paths.home, element: <HomeRoute /> },
      { path: paths.scenarios, element: guarded('scenarios:read', <ScenariosRoute />) },
      { path: paths.scenario(':id'), element: guarded('scenarios:read', <ScenarioRoute />) },
      { path: paths.run(':id'), element: guarded('scenarios:read', <RunRoute />) },
      { path: paths.workstation(':id'), element: guarded('scenarios:read', <WorkstationRoute />) },
      { path: paths.places, element: guarded('scenarios:read', <PlacesRoute />) },
      { path: paths.agents, element: guarded('scenarios:read', <AgentsPage />) },
      { path: paths.sizeProfiles, element: guarded('scenarios:read', <SizeProfilesPage />) },
      { path: paths.sizeProfile(':id'), element: guarded('scenarios:read', <SizeProfileDetailPage />) },
      { path: paths.audit, element: guarded('audit:read', <AuditRoute />) },
      { path: paths.station, element: guarded('boards:read-own', <StationRoute />) },
      { path: '/station/:workstationId', element: guarded('boards:read-own', <StationRoute />) },
      { path: paths.people, element: guarded('people:manage', <PeoplePage />) },
      { path: paths.outbox, element: guarded('outbox:read', <OutboxPage />) },
      { path: paths.particleCalculator, element: guarded('calculators:use', <ParticleCalculatorPage />) },
      { path: paths.hoodCalculator, element: guarded('calculators:use', <HoodCalculatorPage />) },
      { path: paths.sweep(':id'), element: guarded('scenarios:write', <SweepRoute />) },
      { path: paths.report(':id'), element: guarded('scenarios:read', <ReportRoute />) },
      { path: paths.compare, element: guarded('scenarios:read', <CompareRoute />) },
      { path: paths.engineCheck, element: guarded('runs:write', <EngineCheckPage />) },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
