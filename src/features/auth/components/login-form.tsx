import { useState, type FormEvent } from 'react';
import { loginSchema } from '../../../../shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorMessage } from '@/components/ui/status';
import { fieldErrors } from '@/lib/form-errors';
import type { SignedInUser } from '@/lib/auth';
import { useLogin } from '@/features/auth/api/login';

export function LoginForm({ onSignedIn }: { onSignedIn: (user: SignedInUser) => void }) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [submitted, setSubmitted] = useState(false);
  const login = useLogin();
  const parsed = loginSchema.safeParse({ email, password });
  const errors = submitted ? fieldErrors(parsed) : {};

  function submit(e: FormEvent) {
    e.preventDefault();
    setSubmitted(true);
    if (parsed.success) login.mutate(parsed.data, { onSuccess: onSignedIn });
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={errors.email}
        // eslint-disable-next-line jsx-a11y/no-autofocus -- this page has one job, so the cursor starts in its first field
        autoFocus
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={errors.password}
      />
      {login.error && <ErrorMessage title="Not signed in" error={login.error} />}
      <Button type="submit" disabled={login.isPending}>
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
