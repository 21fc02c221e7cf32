import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useMembers, useProject, useRemoveMember, useSetMember } from '../api/projects';
import { useProjectUnits } from '../lib/unit-system';
import { useMe } from '../api/session';
import type { Member, MemberList, Role } from '@hoopline/contract';
import { ROLE_LABEL } from '../components/badges';
import { Button } from '../components/button';
import { DataTable, type Column } from '../components/data-table';
import { Dialog } from '../components/dialog';
import { ErrorView } from '../components/error-view';
import { FormError } from '../components/field';
import { PageHeader, Panel, projectCrumbs } from '../components/page';
import { messageFor } from '../components/server-errors';
import { PageSkeleton, TableSkeleton } from '../components/skeleton';
import { formatDate } from '../lib/dates';
import { AddMemberForm, AdminAddMemberForm } from '../features/projects/add-member-form';
import { membersNotice } from '@hoopline/present';

/** Who changes the members, and whether anyone can check: said above the table (words from present). */
function WhoChecksNotice({ list, myId }: { list: MemberList; myId: string }) {
  const notice = membersNotice({ ...list, readerId: myId });
  return (
    <div className="space-y-2 text-sm" aria-label="Who changes members">
      {notice.noChecker ? (
        <p role="status" className="rounded border border-warn bg-warn-soft px-3 py-2">
          <strong>{notice.noChecker.headline}</strong> {notice.noChecker.advice}
        </p>
      ) : null}
      <p className="text-muted">{notice.who}</p>
    </div>
  );
}

export function ProjectMembersRoute() {
  const { projectId = '' } = useParams();
  const me = useMe();
  const project = useProject(projectId);
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const members = useMembers(projectId);
  const setMember = useSetMember(projectId);
  const remove = useRemoveMember(projectId);
  const [removing, setRemoving] = useState<Member | null>(null);
  const [error, setError] = useState<string | null>(null);

  if (project.isPending) return <PageSkeleton label="Loading members" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const p = project.data;
  // The server says who may change members (the owner, administrators): issue 16.3.
  const canManage = members.data?.canManage ?? false;

  const columns: Column<Member>[] = [
    { key: 'name', header: 'Name', render: (m) => m.user.name },
    { key: 'email', header: 'E-mail', render: (m) => m.user.email },
    {
      key: 'role',
      header: 'Role',
      render: (m) =>
        canManage ? (
          <select
            aria-label={`Role of ${m.user.name}`}
            className="rounded border border-line-strong bg-panel px-1.5 py-0.5 text-sm"
            value={m.role}
            onChange={(event) =>
              setMember.mutate(
                { userId: m.user.id, role: event.target.value as Role },
                { onError: (e) => setError(messageFor(e)), onSuccess: () => setError(null) },
              )
            }
          >
            {(Object.keys(ROLE_LABEL) as Role[]).map((r) => (
              <option
                key={r}
                value={r}
                // Nobody makes themselves a checker (the server refuses it too).
                disabled={r === 'checker' && m.user.id === me.user.id && m.role !== 'checker'}
              >
                {ROLE_LABEL[r]}
              </option>
            ))}
          </select>
        ) : (
          ROLE_LABEL[m.role]
        ),
    },
    { key: 'added', header: 'Added', numeric: true, render: (m) => formatDate(m.addedAt) },
    ...(canManage
      ? [
          {
            key: 'actions',
            header: <span className="sr-only">Actions</span>,
            render: (m: Member) => (
              <Button size="sm" variant="danger" onClick={() => setRemoving(m)}>
                Remove<span className="sr-only"> {m.user.name}</span>
              </Button>
            ),
          },
        ]
      : []),
  ];

  return (
    <>
      <PageHeader
        title="Members"
        crumbs={projectCrumbs(p, { label: 'Members' })}
        subtitle="Designers create and submit components; checkers countersign or return them; fabricators see issued revisions only."
      />
      <FormError message={error} />
      {members.isPending ? (
        <TableSkeleton label="Loading members" />
      ) : members.isError ? (
        <ErrorView error={members.error} />
      ) : (
        <div className="space-y-4">
          <WhoChecksNotice list={members.data} myId={me.user.id} />
          <DataTable
            caption="Project members"
            columns={columns}
            rows={members.data.items}
            rowKey={(m) => m.user.id}
          />
          {canManage ? (
            <Panel title="Add a member">
              {me.user.isAdmin ? (
                <AdminAddMemberForm projectId={p.id} members={members.data.items} />
              ) : (
                <AddMemberForm projectId={p.id} members={members.data.items} />
              )}
            </Panel>
          ) : null}
        </div>
      )}
      <Dialog
        open={removing !== null}
        title="Remove member"
        onClose={() => setRemoving(null)}
        footer={
          <>
            <Button onClick={() => setRemoving(null)}>Cancel</Button>
            <Button
              variant="danger"
              busy={remove.isPending}
              onClick={() =>
                removing &&
                remove.mutate(removing.user.id, {
                  onSuccess: () => setRemoving(null),
                  onError: (e) => {
                    setError(messageFor(e));
                    setRemoving(null);
                  },
                })
              }
            >
              Remove
            </Button>
          </>
        }
      >
        <p className="text-sm">
          Remove {removing?.user.name} from {p.number}? They keep their past signatures; they lose
          access to the project.
        </p>
      </Dialog>
    </>
  );
}
