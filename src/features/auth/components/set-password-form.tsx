import { useState, type FormEvent } from 'react';
import { setPasswordSchema } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage } from '@/components/ui/status';
import { fieldErrors } from '@/lib/form-errors';
import { useSetPassword } from '@/features/auth/api/set-password';

export function SetPasswordForm({ token, onDone }: { token: string; onDone: (email: string) => void }) {
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [submitted, setSubmitted] = useState(false);
  const mutation = useSetPassword();
  const parsed = setPasswordSchema.safeParse({ token, password });
  const errors = submitted ? fieldErrors(parsed, mutation.error) : {};
  const mismatch = submitted && repeat !== password ? 'The two passwords differ' : undefined;

  function submit(e: FormEvent) {
    e.preventDefault();
    setSubmitted(true);
    if (parsed.success && repeat === password) mutation.mutate(parsed.data, { onSuccess: (r) => onDone(r.email) });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={errors.password}
        hint="At least 10 characters."
        // eslint-disable-next-line jsx-a11y/no-autofocus -- this page has one job, so the cursor starts in its first field
        autoFocus
      />
      <TextField
        label="Repeat the password"
        type="password"
        autoComplete="new-password"
        value={repeat}
        onChange={(e) => setRepeat(e.target.value)}
        error={mismatch}
      />
      {errors.token && (
        <ErrorMessage
          title="Link not usable"
          error={errors.token === 'Expired or used' ? mutation.error : 'This link is incomplete. Open it again from the e-mail.'}
        />
      )}
      {mutation.error && !errors.token && <ErrorMessage error={mutation.error} />}
      <Button type="submit" disabled={mutation.isPending}>
        {mutation.isPending ? 'Saving…' : 'Set password'}
      </Button>
    </form>
  );
}
