import { useState, type FormEvent } from 'react';
import type { z } from 'zod';
import { fieldErrors } from '@/lib/form-errors';

type Mutation<T, R> = { mutate: (v: T, o: { onSuccess: (r: R) => void }) => void; error: unknown };

// Field messages appear only after the first submit, from the same shared schema the server uses.
export function useSchemaSubmit<S extends z.ZodType, R>(
  schema: S,
  value: unknown,
  mutation: Mutation<z.output<S>, R>,
  onDone?: (r: R) => void,
) {
  const [submitted, setSubmitted] = useState(false);
  const parsed = schema.safeParse(value);
  const errors = submitted ? fieldErrors(parsed, mutation.error) : {};
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSubmitted(true);
    if (parsed.success)
      mutation.mutate(parsed.data, {
        onSuccess: (r) => {
          setSubmitted(false);
          onDone?.(r);
        },
      });
  };
  return { errors, submit };
}
