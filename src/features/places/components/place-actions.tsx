import { Can } from '@/components/can';
import { Button } from '@/components/ui/button';
import { ErrorMessage } from '@/components/ui/status';
import { useDeletePlace, type PlaceKind } from '@/features/places/api/delete-place';

const small = 'px-2 py-1 text-xs';

// Edit and delete for one place. Deleting hides it from lists and pickers and keeps its records; the server
// refuses while something live is inside it and says what, which is shown here.
export function PlaceActions({ kind, id, name, onEdit }: { kind: PlaceKind; id: number; name: string; onEdit: () => void }) {
  const remove = useDeletePlace();
  const confirmDelete = () => {
    if (window.confirm(`Delete ${kind} “${name}”? It leaves every list and picker; its audit trail stays.`)) remove.mutate({ kind, id });
  };
  return (
    <Can permission="scenarios:write">
      <span className="ml-2 inline-flex gap-1 align-middle">
        <Button variant="ghost" className={small} onClick={onEdit} aria-label={`Edit ${kind} ${name}`}>
          Edit
        </Button>
        <Button
          variant="ghost"
          className={`${small} text-act`}
          onClick={confirmDelete}
          disabled={remove.isPending}
          aria-label={`Delete ${kind} ${name}`}
        >
          Delete
        </Button>
      </span>
      {remove.error && (
        <div className="mt-2">
          <ErrorMessage title="Not deleted" error={remove.error} />
        </div>
      )}
    </Can>
  );
}
