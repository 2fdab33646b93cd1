import type { QueryKey } from '@tanstack/react-query';
import { dateText } from '../../../../shared/format/index';
import { useState, type FormEvent } from 'react';
import { reviewDueDate, reviewMonthsFor } from '../../../../shared/approval/review-date';
import type { Banner } from '../../../../shared/schemas/workspace-views';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { issueFor } from '@/lib/api-client';
import { useApprove } from '@/features/decisions/api/approve';

export function ApproveForm({
  scenarioId,
  run,
  refresh,
}: {
  scenarioId: number;
  run: { id: number; banner: Banner | null; outOfDate: boolean } | null;
  /** Queries an approval makes stale. */
  refresh: readonly QueryKey[];
}) {
  const [note, setNote] = useState('');
  const [reviewDate, setReviewDate] = useState(() => reviewDueDate(run?.banner ?? null, new Date()));
  const approve = useApprove(refresh);
  if (!run) return <p className="text-sm text-muted">Save a run of this scenario before approving it.</p>;
  if (run.outOfDate)
    return <p className="text-sm text-watch">⟳ The latest saved run is out of date: run and save again before approving.</p>;
  if (run.banner === 'act')
    return (
      <p className="text-sm text-act">✕ The latest run is above the limit (Act): this option cannot be approved as the current control.</p>
    );
  const submit = (e: FormEvent) => {
    e.preventDefault();
    approve.mutate({ scenarioId, body: { runId: run.id, note, reviewDate } });
  };
  return (
    <form
      onSubmit={submit}
      aria-label="Approve as the station's current control"
      className="grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-start"
    >
      <TextField label="Note (what was checked)" value={note} onChange={(e) => setNote(e.target.value)} />
      <TextField
        label="Review by"
        type="date"
        value={reviewDate}
        onChange={(e) => setReviewDate(e.target.value)}
        error={issueFor(approve.error, 'body.reviewDate')}
        hint={`${run.banner === 'watch' ? 'Watch result: ' : ''}${reviewMonthsFor(run.banner)} months suggested`}
      />
      <Button type="submit" className="sm:mt-6" disabled={approve.isPending}>
        ★ Approve
      </Button>
      <div className="sm:col-span-3">
        {approve.isSuccess && (
          <Notice>Approved. The station board now shows this control, to be reviewed by {dateText(approve.data.reviewDate)}.</Notice>
        )}
        {approve.error && <ErrorMessage title="Not approved" error={approve.error} />}
      </div>
    </form>
  );
}
