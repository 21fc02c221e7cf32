import { useNavigate } from 'react-router-dom';
import { useMe } from '../../api/session';
import type { Project, Revision } from '@hoopline/contract';
import { Panel } from '../../components/page';
import { SignOffForm } from './sign-off-form';

/** Why this person may not sign this revision, or null. Four-eyes first: it is the rule people meet. */
export function signOffBlockedReason(
  revision: Revision,
  project: Project,
  me: { id: string; isAdmin: boolean },
): string | null {
  if (revision.author.id === me.id) {
    return 'You authored this revision, so you cannot countersign or return it: a second engineer must check it (four-eyes rule).';
  }
  if (project.myRole !== 'checker') {
    return me.isAdmin
      ? 'Administrators manage people and projects but never sign: only a checker of this project can countersign.'
      : 'Only a checker of this project can countersign or return a revision.';
  }
  if (revision.status !== 'submitted') return 'This revision is not awaiting check.';
  return null;
}

export function SignOffPanel({ revision, project }: { revision: Revision; project: Project }) {
  const me = useMe();
  const navigate = useNavigate();
  const blocked = signOffBlockedReason(revision, project, me.user);
  return (
    <Panel title="Check and sign off" id="sign-off">
      <SignOffForm
        revision={revision}
        blockedReason={blocked}
        countersignBlockedReason={null}
        onDone={() => navigate('/check-queue')}
      />
    </Panel>
  );
}
