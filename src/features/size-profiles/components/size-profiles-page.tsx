import { Can } from '@/components/can';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { Page } from '@/components/ui/page';
import { PROFILES_HEADER, profileRow } from '@/features/size-profiles/lib/profiles-csv';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { useSizeProfiles } from '@/features/size-profiles/api/get-size-profiles';
import { LognormalForm } from './lognormal-form';
import { SizeProfilesTable } from './size-profiles-table';
import { UploadForm } from './upload-form';
import { TemplateLinks } from './format-help';

export function SizeProfilesPage() {
  const profiles = useSizeProfiles();
  return (
    <Page
      title="Size profiles"
      intro="How the dust’s mass spreads over particle size. Upload impactor stages, counter bins or plain bins, or enter a lognormal; each profile is fitted with an MMAD and GSD and split into respirable, thoracic and inhalable fractions (ISO 7708)."
    >
      <div className="space-y-6">
        {profiles.isPending && <Spinner label="Loading size profiles…" />}
        {profiles.error && <ErrorMessage error={profiles.error} />}
        {profiles.data &&
          (profiles.data.items.length ? (
            <div className="space-y-2">
              <SizeProfilesTable rows={profiles.data.items} />
              <DownloadCsvButton name={['size profiles']} header={PROFILES_HEADER} rows={() => profiles.data.items.map(profileRow)} />
            </div>
          ) : (
            <EmptyState title="No size profiles yet">
              <TemplateLinks />
            </EmptyState>
          ))}
        <Can permission="scenarios:write">
          <UploadForm />
          <LognormalForm />
        </Can>
      </div>
    </Page>
  );
}
