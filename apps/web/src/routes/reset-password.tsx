import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { AuthCard } from '../features/auth/auth-card';
import { CompleteResetForm, RequestResetForm } from '../features/auth/reset-forms';

export function RequestResetRoute() {
  const [sent, setSent] = useState(false);
  return (
    <AuthCard title="Reset your password">
      {sent ? (
        <div role="status" className="space-y-3 text-sm">
          <p>
            If that address belongs to an account, instructions to reset its password are on their
            way. Your administrator can also give you a reset link.
          </p>
          <Link to="/sign-in" className="text-accent underline">
            Back to sign-in
          </Link>
        </div>
      ) : (
        <>
          <p className="mb-3 text-xs text-muted">Enter the e-mail address you sign in with.</p>
          <RequestResetForm onSent={() => setSent(true)} />
          <Link to="/sign-in" className="mt-3 block text-center text-xs text-muted hover:underline">
            Back to sign-in
          </Link>
        </>
      )}
    </AuthCard>
  );
}

export function CompleteResetRoute() {
  const { token = '' } = useParams();
  const [done, setDone] = useState(false);
  return (
    <AuthCard title="Choose a new password">
      {done ? (
        <div role="status" className="space-y-3 text-sm">
          <p>Your password has been changed and every other session signed out.</p>
          <Link to="/sign-in" className="text-accent underline">
            Sign in with the new password
          </Link>
        </div>
      ) : (
        <CompleteResetForm token={token} onDone={() => setDone(true)} />
      )}
    </AuthCard>
  );
}
