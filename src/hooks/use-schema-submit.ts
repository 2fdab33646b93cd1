import { useState, type FormEvent } from 'react';
import type { z } from 'zod';
import { fieldErrors } from '@/lib/form-errors';

type Mutation<T, R> = { mutate: (v: T, o: { onSuccess: (r: R) => void }) => void; error: unknown };
// Messages for what the shared schema cannot know (a repeated password); any message blocks sending.
type Checks = Record<string, string | undefined>;

// Field messages appear only after the first submit, from the same shared schema the server uses.
export function useSchemaSubmit<S extends z.ZodType, R>(
  schema: S,
  value: unknown,
  mutation: Mutation<z.output<S>, R>,
  onDone?: (r: R) => void,
  checks: Checks = {},
) {
  const [submitted, setSubmitted] = useState(false);
  const parsed = schema.safeParse(value);
  const failed = Object.entries(checks).filter((c): c is [string, string] => c[1] !== undefined);
  const errors = submitted ? { ...Object.fromEntries(failed), ...fieldErrors(parsed, mutation.error) } : {};
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSubmitted(true);
    if (parsed.success && failed.length === 0)
      mutation.mutate(parsed.data, {
        onSuccess: (r) => {
          setSubmitted(false);
          onDone?.(r);
        },
      });
  };
  return { errors, submit };
}
