import type { InvitationCreated, PasswordResetIssued } from '@hoopline/contract';
import { Button } from '../../components/button';
import { INPUT_CLASS } from '../../components/field';
import { formatDateTime } from '../../lib/dates';

/**
 * What the admin is told after an invitation or a reset: that it was mailed
 * (the server has a mail server), or the one-time link to pass on (it has
 * none, API.md "Mail").
 */
export type Delivery =
  | { readonly kind: 'mailed'; readonly text: string }
  | {
      readonly kind: 'link';
      readonly title: string;
      readonly link: string;
      readonly expiresAt: string;
    };

export function invitationDelivery(result: InvitationCreated, email: string): Delivery {
  if (result.delivery === 'mail') {
    return {
      kind: 'mailed',
      text: `Invitation mailed to ${email}. The link in it can be used once and expires ${formatDateTime(result.invitation.expiresAt)}.`,
    };
  }
  return {
    kind: 'link',
    title: `Invitation for ${email}`,
    link: `${window.location.origin}/invitation/${result.token}`,
    expiresAt: result.invitation.expiresAt,
  };
}

export function resetDelivery(
  result: PasswordResetIssued,
  user: { name: string; email: string },
): Delivery {
  if (result.delivery === 'mail') {
    return {
      kind: 'mailed',
      text: `Reset link mailed to ${user.email}. It can be used once and expires ${formatDateTime(result.expiresAt)}.`,
    };
  }
  return {
    kind: 'link',
    title: `Password reset link for ${user.name}`,
    link: `${window.location.origin}/reset-password/${result.token}`,
    expiresAt: result.expiresAt,
  };
}

export function DeliveryNotice({
  delivery,
  onDismiss,
}: {
  delivery: Delivery;
  onDismiss: () => void;
}) {
  if (delivery.kind === 'mailed') {
    return (
      <div
        role="status"
        className="flex items-center justify-between gap-3 rounded border border-accent bg-accent-soft px-3 py-2 text-sm"
      >
        <p>{delivery.text}</p>
        <Button size="sm" variant="ghost" onClick={onDismiss}>
          Dismiss
        </Button>
      </div>
    );
  }
  return (
    <div role="status" className="rounded border border-accent bg-accent-soft px-3 py-2 text-sm">
      <p className="font-medium">{delivery.title}</p>
      <p className="mt-1 text-xs">
        No mail server is configured, so pass this link on yourself. It can be used once and expires{' '}
        {formatDateTime(delivery.expiresAt)}.
      </p>
      <div className="mt-1 flex items-center gap-2">
        <input
          readOnly
          aria-label="Link"
          value={delivery.link}
          className={`${INPUT_CLASS} font-mono text-xs`}
          onFocus={(e) => e.target.select()}
        />
        <Button size="sm" onClick={() => void navigator.clipboard?.writeText(delivery.link)}>
          Copy
        </Button>
        <Button size="sm" variant="ghost" onClick={onDismiss}>
          Dismiss
        </Button>
      </div>
    </div>
  );
}
