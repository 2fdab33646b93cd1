import { dateText, timeText } from '../../../../shared/format/index';
import type { StationBoard as Board, WatchCause } from '../../../../shared/schemas/workspace-views';
import { BANNER_LABEL, type Banner } from '../../../../shared/vocabulary/index';
import { BANNER_CLASSES } from '@/components/banner-badge';
import { Cautions } from '@/components/cautions';

// The operator's board says what the state means at the bench, not how it was computed.
const FOR_OPERATOR: Record<Exclude<Banner, 'watch'>, string> = {
  clear: 'Controls are working as assessed',
  act: 'Stop: the controls are not confirmed',
};

// Watch has several causes; only one of them is exposure near the limit.
const WATCH_FOR_OPERATOR: Record<WatchCause, string> = {
  'near-limit': 'Close to the limit: follow the rules exactly',
  undecided: 'Not yet confirmed: follow the rules exactly',
  'capture-short': 'The hood may be too weak here: follow the rules exactly',
  'out-of-date': 'Being checked again: follow the rules exactly',
};

export const operatorHeadline = (board: Pick<Board, 'banner' | 'watchCause'>) =>
  board.banner === 'watch' ? WATCH_FOR_OPERATOR[board.watchCause ?? 'near-limit'] : FOR_OPERATOR[board.banner];

export function StationBoard({ board }: { board: Board }) {
  const look = BANNER_LABEL[board.banner];
  const c = BANNER_CLASSES[look.colour];
  return (
    <article aria-labelledby={`board-${board.workstationId}`} className="mx-auto max-w-3xl">
      <h1 id={`board-${board.workstationId}`} className="text-3xl">
        {board.workstationName}
      </h1>
      <div
        role="status"
        data-testid="station-banner"
        className={`mt-6 flex items-center gap-6 rounded-2xl border-4 p-6 ${c.border} ${c.soft} ${c.text}`}
      >
        <span
          aria-hidden="true"
          className="flex h-20 w-20 shrink-0 items-center justify-center rounded-full border-4 border-current text-5xl font-bold"
        >
          {look.icon}
        </span>
        <div>
          <p className="text-5xl font-bold">{look.word}</p>
          <p className="mt-1 text-xl font-semibold">{operatorHeadline(board)}</p>
        </div>
      </div>
      {board.needsReview && (
        <p className="mt-4 rounded-lg border-2 border-watch bg-watch-soft p-3 text-lg font-semibold text-watch">
          <span aria-hidden="true">⟳ </span>Needs review: ask your supervisor to have this station re-assessed.
        </p>
      )}
      <h2 className="mt-8 text-2xl">What to do</h2>
      <ol className="mt-3 list-decimal space-y-3 pl-7 text-xl leading-relaxed">
        {board.advice.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ol>
      <dl className="mt-8 grid gap-2 text-lg sm:grid-cols-2">
        <div>
          <dt className="text-muted">Control in use</dt>
          <dd className="font-semibold">{board.control ?? 'None approved'}</dd>
        </div>
        <div>
          <dt className="text-muted">Next review</dt>
          <dd className="font-semibold">{dateText(board.reviewDate)}</dd>
        </div>
      </dl>
      <p className="mt-4 text-sm text-muted">Checked {timeText(board.checkedAt)}; this page refreshes itself every minute.</p>
      <Cautions compact />
    </article>
  );
}
