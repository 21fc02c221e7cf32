import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { ApiError } from '../api/client';
import { invitationQuery } from '../api/session';
import { Skeleton } from '../components/skeleton';
import { AcceptInvitationForm } from '../features/auth/accept-invitation-form';
import { AuthCard } from '../features/auth/auth-card';
import { messageFor } from '../components/server-errors';

export function AcceptInvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invitation = useQuery(invitationQuery(token));
  return (
    <AuthCard title="Accept your invitation">
      {invitation.isPending ? (
        <div role="status" aria-label="Loading the invitation" className="space-y-2">
          <Skeleton className="h-8 w-full" />
          <Skeleton className="h-8 w-full" />
        </div>
      ) : invitation.isError ? (
        <div role="alert" className="space-y-3 text-sm">
          <p>
            {invitation.error instanceof ApiError && invitation.error.status === 404
              ? 'This invitation has been used or has expired. Ask your administrator for a new one.'
              : messageFor(invitation.error)}
          </p>
          <Link to="/sign-in" className="text-accent underline">
            Go to sign-in
          </Link>
        </div>
      ) : (
        <AcceptInvitationForm
          token={token}
          email={invitation.data.email}
          name={invitation.data.name}
          onAccepted={() => navigate('/projects', { replace: true })}
        />
      )}
    </AuthCard>
  );
}
