import { dateText } from '../../../../shared/format/index';
import type { Approval } from '../../../../shared/schemas/workspace-views';

const FIELDS = ['Assessed by', 'Reviewed by', 'Date', 'Signature'];

export function ReportSignOff({ approval, scenarioId }: { approval: Approval | null; scenarioId: number }) {
  const ours = approval?.scenarioId === scenarioId;
  return (
    <section aria-labelledby="report-sign-off" className="report-section mt-8 break-inside-avoid">
      <h2 id="report-sign-off">4. Approval and sign-off</h2>
      <div className="mt-2 text-sm" data-testid="report-approval">
        {!approval && <p>The workstation has no approved control yet.</p>}
        {approval && (
          <p>
            {ours ? 'This scenario is' : `“${approval.scenarioName}” is`} the station’s current approved control: approved by{' '}
            {approval.approvedBy} on {dateText(approval.approvedAt)}, review by {dateText(approval.reviewDate)}
            {approval.needsReview ? ` — needs review (${approval.reviewReason ?? 'due for a look'})` : ''}.
            {approval.note && <> Note: “{approval.note}”</>}
          </p>
        )}
      </div>
      <dl className="mt-4 grid gap-x-8 gap-y-6 sm:grid-cols-2 print:grid-cols-2">
        {FIELDS.map((label) => (
          <div key={label} className="flex items-end gap-2">
            <dt className="shrink-0 text-sm font-semibold">{label}</dt>
            <dd aria-label={`${label} (blank)`} className="h-7 flex-1 border-b border-ink" />
          </div>
        ))}
      </dl>
    </section>
  );
}
