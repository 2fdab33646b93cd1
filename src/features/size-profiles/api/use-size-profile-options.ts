import { useQueries } from '@tanstack/react-query';
import { sizeProfileQueryOptions } from './get-size-profile';
import { useSizeProfiles } from './get-size-profiles';

// The editor needs each stored profile in the scenario's own form, which only the detail carries.
export function useSizeProfileOptions() {
  const list = useSizeProfiles().data?.items ?? [];
  const details = useQueries({ queries: list.map((p) => sizeProfileQueryOptions(p.id)) });
  return details.flatMap((d) => (d.data ? [{ id: d.data.id, name: d.data.name, sizeProfile: d.data.sizeProfile }] : []));
}
