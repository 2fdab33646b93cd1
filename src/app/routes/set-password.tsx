import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SetPasswordForm } from '@/features/auth/components/set-password-form';
import { Notice } from '@/components/ui/status';
import { AuthCard } from './auth-card';

export function SetPasswordRoute() {
  const [params] = useSearchParams();
  const [doneFor, setDoneFor] = useState<string>();
  const token = params.get('token') ?? '';
  return (
    <AuthCard title="Set your password" intro="Choose a password for your Motewalk account.">
      {doneFor ? (
        <div className="space-y-4">
          <Notice>Password set for {doneFor}.</Notice>
          <Link to={paths.login} className="font-semibold text-accent underline">
            Sign in now
          </Link>
        </div>
      ) : (
        <SetPasswordForm token={token} onDone={setDoneFor} />
      )}
    </AuthCard>
  );
}
