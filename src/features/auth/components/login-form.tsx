import { useState } from 'react';
import { loginSchema } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage } from '@/components/ui/status';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { bindFields } from '@/lib/bind-fields';
import type { SignedInUser } from '@/lib/auth';
import { useLogin } from '@/features/auth/api/login';

export function LoginForm({ onSignedIn }: { onSignedIn: (user: SignedInUser) => void }) {
  const [form, setForm] = useState({ email: '', password: '' });
  const login = useLogin();
  const { errors, submit } = useSchemaSubmit(loginSchema, form, login, onSignedIn);
  const field = bindFields(form, setForm, errors);

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {/* eslint-disable-next-line jsx-a11y/no-autofocus -- this page has one job, so the cursor starts in its first field */}
      <TextField label="E-mail" type="email" autoComplete="username" {...field('email')} autoFocus />
      <TextField label="Password" type="password" autoComplete="current-password" {...field('password')} />
      {login.error && <ErrorMessage title="Not signed in" error={login.error} />}
      <Button type="submit" disabled={login.isPending}>
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
