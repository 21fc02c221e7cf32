import type { Verdict } from '@hoopline/calc';
import type { RevisionStatus, Role } from '../api/types';

const PILL =
  'inline-flex items-center gap-1 rounded-full border px-2 py-px text-xs font-medium whitespace-nowrap';

const STATUS: Record<RevisionStatus, { label: string; className: string }> = {
  draft: { label: 'Draft', className: 'border-line-strong text-muted' },
  submitted: { label: 'Awaiting check', className: 'border-warn bg-warn-soft text-warn' },
  countersigned: { label: 'Countersigned', className: 'border-pass bg-pass-soft text-pass' },
  returned: { label: 'Returned', className: 'border-fail bg-fail-soft text-fail' },
};

export function StatusBadge({
  status,
  superseded = false,
}: {
  status: RevisionStatus;
  superseded?: boolean;
}) {
  const s = STATUS[status];
  return (
    <span className={`${PILL} ${s.className}`}>
      {s.label}
      {superseded ? <span className="font-normal">(superseded)</span> : null}
    </span>
  );
}

const VERDICT: Record<Verdict, { label: string; mark: string; className: string }> = {
  pass: { label: 'Passes', mark: '+', className: 'border-pass bg-pass-soft text-pass' },
  fail: { label: 'Fails', mark: '×', className: 'border-fail bg-fail-soft text-fail' },
  'outside-validity': {
    label: 'Outside validity',
    mark: '!',
    className: 'border-warn bg-warn-soft text-warn',
  },
  'no-checks': { label: 'No checks', mark: '·', className: 'border-line-strong text-muted' },
};

/** The verdict in words and a mark, never colour alone. */
export function VerdictBadge({ verdict, size = 'sm' }: { verdict: Verdict; size?: 'sm' | 'lg' }) {
  const v = VERDICT[verdict];
  return (
    <span className={`${PILL} ${v.className} ${size === 'lg' ? 'px-3 py-0.5 text-sm' : ''}`}>
      <span aria-hidden="true" className="font-mono">
        {v.mark}
      </span>
      <span>{v.label}</span>
    </span>
  );
}

export const ROLE_LABEL: Record<Role, string> = {
  designer: 'Designer',
  checker: 'Checker',
  fabricator: 'Fabricator',
};

export function RoleBadge({ role }: { role: Role | null }) {
  if (!role) return <span className="text-xs text-muted">–</span>;
  return <span className={`${PILL} border-line-strong text-ink`}>{ROLE_LABEL[role]}</span>;
}
