import { useState } from 'react';
import { ApiError } from '@/lib/api-client';

// Holds the record as the server now stores it after a 409, so the form can show both and let the person choose.
export function useVersionConflict<R extends { version: number }>() {
  const [saved, setSaved] = useState<R | null>(null);
  const onError = (e: unknown) => {
    if (e instanceof ApiError && e.status === 409 && e.code === 'version_conflict') setSaved(e.body.current as R);
  };
  return { saved, onError, clear: () => setSaved(null) };
}
