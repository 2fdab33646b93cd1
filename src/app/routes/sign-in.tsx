import { useNavigate, useSearchParams } from 'react-router-dom';
import { ROLE_HOME } from '../../../shared/auth/permissions';
import { LoginForm } from '@/features/auth/components/login-form';
import { AuthCard } from './auth-card';

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get('next');
  return (
    <AuthCard title="Sign in to Motewalk" intro="Breathing-zone dust estimates for local exhaust design.">
      <LoginForm
        onSignedIn={(user) =>
          navigate(next && next.startsWith('/') && !next.startsWith('//') ? next : ROLE_HOME[user.role], { replace: true })
        }
      />
    </AuthCard>
  );
}
