import { useNavigate, useSearchParams } from 'react-router-dom';
import { AuthCard } from '../features/auth/auth-card';
import { SignInForm } from '../features/auth/sign-in-form';
import { safeNext } from './guards';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));
  return (
    <AuthCard title="Sign in">
      {next !== '/' ? (
        <p className="mb-3 text-xs text-muted">Sign in to continue to the page you opened.</p>
      ) : null}
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </AuthCard>
  );
}
