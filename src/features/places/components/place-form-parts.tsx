import type { ComponentProps } from 'react';
import { Button } from '@/components/ui/button';
import { IdSelectField } from '@/components/ui/id-select-field';
import { ErrorMessage, Notice } from '@/components/ui/status';

// One column on a phone that never grows past the box (a select's long option would otherwise widen it).
export const formBox = 'grid grid-cols-1 gap-3 rounded-lg border border-line bg-white p-4 sm:grid-cols-3';

type ParentProps = Omit<ComponentProps<typeof IdSelectField>, 'none' | 'error'> & { missing: boolean };

// The place a new one sits in; the schema's own message for a missing id means nothing to people.
export function ParentField({ missing, ...select }: ParentProps) {
  return <IdSelectField none="Choose…" error={missing ? `Choose a ${select.label.toLowerCase()}` : undefined} {...select} />;
}

type Outcome = { isPending: boolean; isSuccess: boolean; data?: { name: string }; error: unknown };

export function FormEnd({
  noun,
  mutation: m,
  editing,
  onCancel,
}: {
  noun: string;
  mutation: Outcome;
  editing: boolean;
  onCancel?: () => void;
}) {
  return (
    <>
      <div className="flex gap-2 self-end">
        <Button type="submit" disabled={m.isPending}>
          {editing ? 'Save changes' : `Add ${noun.toLowerCase()}`}
        </Button>
        {onCancel && (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
      {m.isSuccess && !editing && (
        <div className="sm:col-span-3">
          <Notice>
            {noun} “{m.data?.name}” added.
          </Notice>
        </div>
      )}
      {m.error && (
        <div className="sm:col-span-3">
          <ErrorMessage title="Not saved" error={m.error} />
        </div>
      )}
    </>
  );
}
