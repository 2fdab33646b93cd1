import { useState } from 'react';
import type { UseMutationResult } from '@tanstack/react-query';
import { useVersionConflict } from '@/hooks/use-version-conflict';
import type { PlaceEdit } from '@/features/places/api/update-place';

type Stored = { id: number; version: number; name: string };
type Done<R> = { onSuccess: (r: R) => void };

// One save for a place form: creates when there is no record, else edits at the version the form started from
// and, on a 409, keeps the stored record for the person to compare with what they typed.
export function usePlaceSave<B, R extends Stored>(
  record: R | undefined,
  create: UseMutationResult<R, Error, B>,
  update: UseMutationResult<R, Error, PlaceEdit<B>>,
) {
  const [base, setBase] = useState(record);
  const conflict = useVersionConflict<R>();
  const edit = (b: R, body: B, o?: Done<R>) =>
    update.mutate({ id: b.id, version: b.version, body }, { onSuccess: o?.onSuccess, onError: conflict.onError });
  const outcome = base ? update : create;
  return {
    mutation: {
      mutate: (body: B, o: Done<R>) => {
        conflict.clear();
        if (base) edit(base, body, o);
        else create.mutate(body, o);
      },
      error: conflict.saved ? null : outcome.error,
    },
    outcome,
    saved: conflict.saved,
    keepMine: (body: B, o?: Done<R>) => {
      const saved = conflict.saved;
      if (!saved) return;
      setBase(saved);
      conflict.clear();
      edit(saved, body, o);
    },
    takeSaved: (): R | null => {
      const saved = conflict.saved;
      if (saved) setBase(saved);
      conflict.clear();
      update.reset();
      return saved;
    },
  };
}
