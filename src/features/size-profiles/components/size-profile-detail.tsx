import { useParams } from 'react-router-dom';
import type { SizeProfileDetail as Detail } from '../../../../shared/schemas/size-profiles';
import { Page } from '@/components/ui/page';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { useSizeProfile } from '@/features/size-profiles/api/get-size-profile';
import { CumulativeCurve } from './cumulative-curve';
import { FractionsList } from './fractions-list';
import { KIND_LABELS } from './kind-labels';
import { SizeHistogram } from './size-histogram';

// What each kind of input leaves to assumption, said beside the numbers it shapes.
const NOTES: Record<Detail['kind'], string> = {
  impactor: 'The top stage is taken to collect up to 2× its cut-point and the backup filter down to 0.1× the last cut-point.',
  counter:
    'Counts became mass with the density you confirmed, treating particles as spheres; edges were converted to aerodynamic diameter.',
  bins: 'Diameters are read as aerodynamic; the mass fractions were rescaled to add up to exactly 1.',
  lognormal:
    'From the MMAD (or the CMD through Hatch–Choate, approximate for aerodynamic diameters below about 1 µm) and GSD given; the fractions are exact for this lognormal.',
  respirable:
    'Only the respirable fraction was given. The curve is an assumed lognormal with that respirable fraction; the thoracic and inhalable figures come from that assumption.',
};

export function SizeProfileDetail({ profile }: { profile: Detail }) {
  const fit = profile.fittedMmad_m !== null && profile.fittedGsd !== null ? { mmad_m: profile.fittedMmad_m, gsd: profile.fittedGsd } : null;
  return (
    <div className="space-y-4">
      <p className="text-sm text-muted">
        {KIND_LABELS[profile.kind]}. {NOTES[profile.kind]} Fit: least squares of probit(cumulative mass) against ln d at the bin edges.
      </p>
      <FractionsList profile={profile} />
      {profile.fittedMmad_m === null && (
        <p className="text-sm text-muted">No lognormal fit: fewer than two bin edges lie strictly between 0 % and 100 % cumulative mass.</p>
      )}
      <div className="grid gap-4 lg:grid-cols-2">
        <SizeHistogram bins={profile.bins} fit={fit} />
        <CumulativeCurve bins={profile.bins} fit={fit} />
      </div>
    </div>
  );
}

export function SizeProfileDetailPage() {
  const id = Number(useParams().id);
  const profile = useSizeProfile(id);
  return (
    <Page
      title={profile.data?.name ?? 'Size profile'}
      intro="Mass distribution by aerodynamic diameter, its lognormal fit, and the ISO 7708 health-related fractions."
    >
      {profile.isPending && <Spinner label="Loading size profile…" />}
      {profile.error && <ErrorMessage error={profile.error} />}
      {profile.data && <SizeProfileDetail profile={profile.data} />}
    </Page>
  );
}
