import { Link, useParams } from 'react-router-dom';
import { BannerBadge } from '@/components/banner-badge';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { paths } from '@/config/paths';
import { useBoard, useBoards } from '@/features/station-board/api/get-boards';
import { StationBoard } from '@/features/station-board/components/station-board';
import { useUser } from '@/lib/auth';

function OneBoard({ id }: { id: number }) {
  const board = useBoard(id);
  if (board.isPending) return <Spinner label="Loading your station…" />;
  if (board.error) return <ErrorMessage error={board.error} />;
  return <StationBoard board={board.data} />;
}

export function StationRoute() {
  const { workstationId } = useParams();
  const user = useUser().data;
  const boards = useBoards();
  if (workstationId) {
    return (
      <main id="main" className="px-4 py-8 sm:px-6">
        <OneBoard id={Number(workstationId)} />
      </main>
    );
  }
  if (boards.isPending) return <Spinner label="Loading your station…" />;
  if (boards.error) return <ErrorMessage error={boards.error} />;
  const items = boards.data.items;
  if (items.length === 1) {
    return (
      <main id="main" className="px-4 py-8 sm:px-6">
        <StationBoard board={items[0]} />
      </main>
    );
  }
  return (
    <Page title="Your station">
      {items.length === 0 ? (
        <EmptyState title={`No station assigned to ${user?.name ?? 'you'} yet`}>
          <p className="text-base">
            Your admin assigns you to a workstation. Its board will show whether the dust controls there are working and what to do.
          </p>
        </EmptyState>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {items.map((b) => (
            <li key={b.workstationId}>
              <Link
                to={paths.board(b.workstationId)}
                className="block rounded-lg border border-line bg-white p-4 text-lg font-semibold hover:border-accent"
              >
                {b.workstationName} · <BannerBadge banner={b.banner} />
              </Link>
            </li>
          ))}
        </ul>
      )}
    </Page>
  );
}
