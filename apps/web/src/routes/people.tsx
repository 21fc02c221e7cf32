import { useState } from 'react';
import {
  useInvitations,
  useIssuePasswordReset,
  useRevokeInvitation,
  useSettings,
  useUpdateSettings,
  useUpdateUser,
  useUsers,
} from '../api/admin';
import { useMe } from '../api/session';
import type { Invitation, User } from '@hoopline/contract';
import { Button } from '../components/button';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView, NotFoundView } from '../components/error-view';
import { FormError } from '../components/field';
import { PageHeader, Panel } from '../components/page';
import { messageFor } from '../components/server-errors';
import { TableSkeleton } from '../components/skeleton';
import { formatDate, formatDateTime } from '../lib/dates';
import { InviteForm } from '../features/admin/invite-form';
import { DeliveryNotice, resetDelivery, type Delivery } from '../features/admin/delivery-notice';
import { SearchForm } from '../components/search-form';

export function PeopleRoute() {
  const me = useMe();
  const [page, setPage] = useState(1);
  const [q, setQ] = useState('');
  const [search, setSearch] = useState('');
  const users = useUsers({ q, page, pageSize: 25 });
  const invitations = useInvitations();
  const updateUser = useUpdateUser();
  const revoke = useRevokeInvitation();
  const reset = useIssuePasswordReset();
  const settings = useSettings();
  const updateSettings = useUpdateSettings();
  const named = settings.data?.projectCreation === 'named';
  const [notice, setNotice] = useState<Delivery | null>(null);
  const [error, setError] = useState<string | null>(null);

  if (!me.user.isAdmin) return <NotFoundView />;

  const userColumns: Column<User>[] = [
    { key: 'name', header: 'Name', render: (u) => u.name },
    { key: 'email', header: 'E-mail', render: (u) => u.email },
    {
      key: 'admin',
      header: 'Administrator',
      render: (u) => (
        <input
          type="checkbox"
          className="h-4 w-4 accent-accent"
          aria-label={`${u.name} is an administrator`}
          checked={u.isAdmin}
          disabled={u.id === me.user.id}
          onChange={(event) =>
            updateUser.mutate(
              { id: u.id, isAdmin: event.target.checked },
              { onError: (e) => setError(messageFor(e)) },
            )
          }
        />
      ),
    },
    {
      key: 'active',
      header: 'Active',
      render: (u) => (
        <input
          type="checkbox"
          className="h-4 w-4 accent-accent"
          aria-label={`${u.name} is active`}
          checked={u.active}
          disabled={u.id === me.user.id}
          onChange={(event) =>
            updateUser.mutate(
              { id: u.id, active: event.target.checked },
              { onError: (e) => setError(messageFor(e)) },
            )
          }
        />
      ),
    },
    {
      key: 'starts',
      header: 'Starts projects',
      render: (u) => (
        <input
          type="checkbox"
          className="h-4 w-4 accent-accent"
          aria-label={`${u.name} may start projects`}
          // Administrators always may; with "everyone" nobody needs naming.
          checked={u.isAdmin || !named || u.mayCreateProjects}
          disabled={u.isAdmin || !named}
          onChange={(event) =>
            updateUser.mutate(
              { id: u.id, mayCreateProjects: event.target.checked },
              { onError: (e) => setError(messageFor(e)) },
            )
          }
        />
      ),
    },
    {
      key: 'units',
      header: 'Units',
      // The vacuum unit only where the person chose one (else their unit system's own).
      render: (u) =>
        `${u.unitSystem === 'si' ? 'SI' : 'US'}${u.vacuumUnit ? `, vacuum in ${u.vacuumUnit}` : ''}`,
    },
    { key: 'since', header: 'Since', numeric: true, render: (u) => formatDate(u.createdAt) },
    {
      key: 'actions',
      header: <span className="sr-only">Actions</span>,
      render: (u) => (
        <Button
          size="sm"
          onClick={() =>
            reset.mutate(u.id, {
              onSuccess: (r) => {
                setError(null);
                setNotice(resetDelivery(r, u));
              },
              onError: (e) => setError(messageFor(e)),
            })
          }
        >
          Reset password<span className="sr-only"> of {u.name}</span>
        </Button>
      ),
    },
  ];

  const invitationColumns: Column<Invitation>[] = [
    { key: 'email', header: 'E-mail', render: (i) => i.email },
    { key: 'name', header: 'Name', render: (i) => i.name },
    { key: 'admin', header: 'Administrator', render: (i) => (i.isAdmin ? 'yes' : 'no') },
    { key: 'created', header: 'Sent', numeric: true, render: (i) => formatDateTime(i.createdAt) },
    {
      key: 'expires',
      header: 'Expires',
      numeric: true,
      render: (i) => formatDateTime(i.expiresAt),
    },
    {
      key: 'accepted',
      header: 'Accepted',
      numeric: true,
      render: (i) => formatDateTime(i.acceptedAt),
    },
    {
      key: 'actions',
      header: <span className="sr-only">Actions</span>,
      render: (i) =>
        i.acceptedAt ? null : (
          <Button
            size="sm"
            variant="danger"
            onClick={() => revoke.mutate(i.id, { onError: (e) => setError(messageFor(e)) })}
          >
            Revoke<span className="sr-only"> invitation of {i.email}</span>
          </Button>
        ),
    },
  ];

  return (
    <>
      <PageHeader
        title="People"
        subtitle="Accounts and invitations. Project roles are set on each project's Members page."
      />
      <div className="flex flex-col gap-4">
        <FormError message={error} />
        {notice ? <DeliveryNotice delivery={notice} onDismiss={() => setNotice(null)} /> : null}
        <Panel title="Who may start projects" id="project-starters">
          <fieldset className="flex flex-col gap-1 text-sm">
            <legend className="mb-1 max-w-prose">
              Whoever starts a project becomes its designer, and designers find people by their
              e-mail address to add them. Keep this to named people so that an account alone does
              not tell who else has one.
            </legend>
            {(
              [
                ['named', 'Administrators and the people ticked under "Starts projects"'],
                ['everyone', 'Everyone with an account'],
              ] as const
            ).map(([value, label]) => (
              <label key={value} className="flex items-center gap-2">
                <input
                  type="radio"
                  name="project-creation"
                  className="accent-accent"
                  value={value}
                  checked={settings.data?.projectCreation === value}
                  disabled={!settings.data || updateSettings.isPending}
                  onChange={() =>
                    updateSettings.mutate(
                      { projectCreation: value },
                      { onError: (e) => setError(messageFor(e)) },
                    )
                  }
                />
                {label}
              </label>
            ))}
          </fieldset>
        </Panel>
        <Panel title="Invite someone" id="invite">
          <InviteForm
            onInvited={(delivery) => {
              setError(null);
              setNotice(delivery);
            }}
          />
        </Panel>
        <section aria-labelledby="people-title">
          <div className="mb-2 flex items-end justify-between gap-2">
            <h2 id="people-title" className="text-sm font-semibold">
              Accounts
            </h2>
            <SearchForm
              id="people-search"
              label="Search people"
              placeholder="Name or e-mail"
              value={search}
              onChange={setSearch}
              onSearch={(query) => {
                setQ(query);
                setPage(1);
              }}
              className=""
            />
          </div>
          {users.isPending ? (
            <TableSkeleton label="Loading people" />
          ) : users.isError ? (
            <ErrorView error={users.error} />
          ) : (
            <>
              <DataTable
                caption="Accounts"
                columns={userColumns}
                rows={users.data.items}
                rowKey={(u) => u.id}
              />
              <Pagination
                page={users.data.page}
                pageSize={users.data.pageSize}
                total={users.data.total}
                onPage={setPage}
                label="People pages"
              />
            </>
          )}
        </section>
        <section aria-labelledby="invitations-title">
          <h2 id="invitations-title" className="mb-2 text-sm font-semibold">
            Invitations
          </h2>
          {invitations.isPending ? (
            <TableSkeleton label="Loading invitations" />
          ) : invitations.isError ? (
            <ErrorView error={invitations.error} />
          ) : (
            <DataTable
              caption="Invitations"
              columns={invitationColumns}
              rows={invitations.data.items}
              rowKey={(i) => i.id}
              empty="No invitations."
            />
          )}
        </section>
      </div>
    </>
  );
}
