import { Page } from '../../components/ui/page';
import { EmptyState } from '../../components/ui/status';
import { useUser } from '../../lib/auth';

export function StationRoute() {
  const user = useUser().data;
  return (
    <Page title="Your station">
      <EmptyState title={`No station board for ${user?.name ?? 'you'} yet`}>
        <p className="text-base">Your admin assigns you to a workstation. Its board will show whether the dust controls there are working and what to do.</p>
      </EmptyState>
    </Page>
  );
}
