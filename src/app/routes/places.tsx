import { Can } from '@/components/can';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { useSites } from '@/features/places/api/get-sites';
import { RoomForm } from '@/features/places/components/room-form';
import { SiteForm } from '@/features/places/components/site-form';
import { WorkstationForm } from '@/features/places/components/workstation-form';
import { PlacesTree } from '@/features/places/components/places-tree';

export function PlacesRoute() {
  const sites = useSites();
  return (
    <Page
      title="Sites and workstations"
      intro="Sites hold rooms; rooms hold workstations. Open a workstation to compare its control options or add one. A place can be deleted once nothing is left inside it: its scenarios and audit trail stay on record."
    >
      {sites.isPending && <Spinner />}
      {sites.error && <ErrorMessage error={sites.error} />}
      {sites.data &&
        (sites.data.items.length ? (
          <PlacesTree sites={sites.data.items} />
        ) : (
          <EmptyState title="No sites yet">Add a site, then a room and a workstation.</EmptyState>
        ))}
      <Can permission="scenarios:write">
        <section className="mt-10 space-y-4" aria-labelledby="add-places">
          <h2 id="add-places">Add places</h2>
          <SiteForm />
          {sites.data && <RoomForm sites={sites.data.items} />}
          {sites.data && <WorkstationForm sites={sites.data.items} />}
        </section>
      </Can>
    </Page>
  );
}
