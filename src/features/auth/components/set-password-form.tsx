import { useState } from 'react';
import { PASSWORD_MIN_LENGTH, setPasswordSchema } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage } from '@/components/ui/status';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { bindFields } from '@/lib/bind-fields';
import { useSetPassword } from '@/features/auth/api/set-password';

export function SetPasswordForm({ token, onDone }: { token: string; onDone: (email: string) => void }) {
  const [form, setForm] = useState({ password: '', repeat: '' });
  const mutation = useSetPassword();
  const { errors, submit } = useSchemaSubmit(setPasswordSchema, { token, password: form.password }, mutation, (r) => onDone(r.email), {
    repeat: form.repeat !== form.password ? 'The two passwords differ' : undefined,
  });
  const field = bindFields(form, setForm, errors);

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        {...field('password')}
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        // eslint-disable-next-line jsx-a11y/no-autofocus -- this page has one job, so the cursor starts in its first field
        autoFocus
      />
      <TextField label="Repeat the password" type="password" autoComplete="new-password" {...field('repeat')} />
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
