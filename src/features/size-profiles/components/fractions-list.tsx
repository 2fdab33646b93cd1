import type { SizeProfileSummary } from '../../../../shared/schemas/size-profiles';
import { micrometres, percent, plain } from '@/features/size-profiles/lib/chart-data';

export function FractionsList({ profile }: { profile: SizeProfileSummary }) {
  const items: [string, string][] = [
    ['Fitted MMAD', micrometres(profile.fittedMmad_m)],
    ['Fitted GSD', plain(profile.fittedGsd)],
    ['Respirable', percent(profile.respirableFraction)],
    ['Thoracic', percent(profile.thoracicFraction)],
    ['Inhalable', percent(profile.inhalableFraction)],
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-5">
      {items.map(([label, value]) => (
        <div key={label} className="rounded-lg border border-line bg-white p-3">
          <dt className="text-xs font-semibold uppercase tracking-wide text-muted">{label}</dt>
          <dd className="mt-1 text-lg font-semibold tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
