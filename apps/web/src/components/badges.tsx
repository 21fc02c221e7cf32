import type { Verdict } from '@hoopline/calc';
import { ROLE_WORDS, STATUS_WORDS, VERDICT_WORDS } from '@hoopline/present';
import type { RevisionStatus, Role } from '@hoopline/contract';

const PILL =
  'inline-flex items-center gap-1 rounded-full border px-2 py-px text-xs font-medium whitespace-nowrap';

// Words from @hoopline/present (the sheet's), colours here.
const STATUS_CLASS: Record<RevisionStatus, string> = {
  draft: 'border-line-strong text-muted',
  submitted: 'border-warn bg-warn-soft text-warn',
  countersigned: 'border-pass bg-pass-soft text-pass',
  returned: 'border-fail bg-fail-soft text-fail',
};

export function StatusBadge({
  status,
  superseded = false,
}: {
  status: RevisionStatus;
  superseded?: boolean;
}) {
  return (
    <span className={`${PILL} ${STATUS_CLASS[status]}`}>
      {STATUS_WORDS[status]}
      {superseded ? <span className="font-normal">(superseded)</span> : null}
    </span>
  );
}

const VERDICT: Record<Verdict, { mark: string; className: string }> = {
  pass: { mark: '+', className: 'border-pass bg-pass-soft text-pass' },
  fail: { mark: '×', className: 'border-fail bg-fail-soft text-fail' },
  'outside-validity': { mark: '!', className: 'border-warn bg-warn-soft text-warn' },
  'no-checks': { mark: '·', className: 'border-line-strong text-muted' },
};

/** The verdict in words and a mark, never colour alone. */
export function VerdictBadge({ verdict, size = 'sm' }: { verdict: Verdict; size?: 'sm' | 'lg' }) {
  const v = VERDICT[verdict];
  return (
    <span className={`${PILL} ${v.className} ${size === 'lg' ? 'px-3 py-0.5 text-sm' : ''}`}>
      <span aria-hidden="true" className="font-mono">
        {v.mark}
      </span>
      <span>{VERDICT_WORDS[verdict].word}</span>
    </span>
  );
}

/** A role in words (@hoopline/present's, as everywhere else). */
export const ROLE_LABEL: Readonly<Record<Role, string>> = ROLE_WORDS;

export function RoleBadge({ role }: { role: Role | null }) {
  if (!role) return <span className="text-xs text-muted">–</span>;
  return <span className={`${PILL} border-line-strong text-ink`}>{ROLE_LABEL[role]}</span>;
}
