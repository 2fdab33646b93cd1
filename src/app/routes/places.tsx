import { Can } from '@/components/can';
import { Page } from '@/components/ui/page';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { useSites } from '@/features/places/api/get-sites';
import { NewRoomForm, NewSiteForm, NewWorkstationForm } from '@/features/places/components/new-place-forms';
import { PlacesTree } from '@/features/places/components/places-tree';

export function PlacesRoute() {
  const sites = useSites();
  return (
    <Page
      title="Sites and workstations"
      intro="Sites hold rooms; rooms hold workstations. Open a workstation to compare its control options or add one."
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
          <NewSiteForm />
          {sites.data && <NewRoomForm sites={sites.data.items} />}
          {sites.data && <NewWorkstationForm sites={sites.data.items} />}
        </section>
      </Can>
    </Page>
  );
}
