import { useSearchParams } from 'react-router-dom';
import { useAudit, type AuditFilter } from '../api/admin';
import { useMe } from '../api/session';
import type { AuditEvent } from '@hoopline/contract';
import { Button } from '../components/button';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView, NotFoundView } from '../components/error-view';
import { SelectField, TextField } from '../components/field';
import { PageHeader } from '../components/page';
import { TableSkeleton } from '../components/skeleton';
import { formatDateTime } from '../lib/dates';

const ENTITY_TYPES = [
  'user',
  'invitation',
  'project',
  'member',
  'material',
  'component',
  'revision',
];

function summaryText(summary: AuditEvent['summary']): string {
  const parts: string[] = [];
  if (summary.before !== undefined) parts.push(`before ${JSON.stringify(summary.before)}`);
  if (summary.after !== undefined) parts.push(`after ${JSON.stringify(summary.after)}`);
  const text = parts.join(' · ');
  return text.length > 240 ? `${text.slice(0, 240)}…` : text;
}

/** Every action, newest first, filterable by action, kind of record and dates; filters live in the URL. */
export function AuditLogRoute() {
  const me = useMe();
  const [params, setParams] = useSearchParams();
  const filter: AuditFilter = {
    ...(params.get('action') ? { action: params.get('action')! } : {}),
    ...(params.get('entityType') ? { entityType: params.get('entityType')! } : {}),
    ...(params.get('actorId') ? { actorId: params.get('actorId')! } : {}),
    ...(params.get('projectId') ? { projectId: params.get('projectId')! } : {}),
    ...(params.get('from') ? { from: params.get('from')! } : {}),
    ...(params.get('to') ? { to: params.get('to')! } : {}),
    page: Math.max(1, Number(params.get('page')) || 1),
  };
  const audit = useAudit(filter);
  if (!me.user.isAdmin) return <NotFoundView />;

  const columns: Column<AuditEvent>[] = [
    { key: 'when', header: 'When', numeric: true, render: (e) => formatDateTime(e.createdAt) },
    {
      key: 'actor',
      header: 'Who',
      render: (e) => e.actor?.name ?? <span className="text-muted">system</span>,
    },
    {
      key: 'action',
      header: 'Action',
      render: (e) => <span className="font-mono text-xs">{e.action}</span>,
    },
    {
      key: 'entity',
      header: 'Record',
      render: (e) => (
        <span className="font-mono text-xs">
          {e.entityType} {e.entityId?.slice(0, 8) ?? ''}
        </span>
      ),
    },
    {
      key: 'summary',
      header: 'Change',
      render: (e) => (
        <span className="font-mono text-xs break-all text-muted">{summaryText(e.summary)}</span>
      ),
    },
  ];

  return (
    <>
      <PageHeader
        title="Audit log"
        subtitle="Every action on people, projects, components and revisions, newest first."
      />
      <form
        className="mb-3 flex flex-wrap items-end gap-3"
        onSubmit={(event) => {
          event.preventDefault();
          const data = new FormData(event.currentTarget);
          const next = new URLSearchParams();
          for (const key of ['action', 'entityType', 'from', 'to']) {
            const value = String(data.get(key) ?? '').trim();
            if (value)
              next.set(key, key === 'from' || key === 'to' ? new Date(value).toISOString() : value);
          }
          setParams(next);
        }}
      >
        <TextField
          name="action"
          label="Action"
          defaultValue={filter.action ?? ''}
          placeholder="e.g. revision.countersigned"
        />
        <SelectField name="entityType" label="Record" defaultValue={filter.entityType ?? ''}>
          <option value="">Any</option>
          {ENTITY_TYPES.map((t) => (
            <option key={t} value={t}>
              {t}
            </option>
          ))}
        </SelectField>
        <TextField
          name="from"
          type="date"
          label="From"
          defaultValue={filter.from?.slice(0, 10) ?? ''}
        />
        <TextField name="to" type="date" label="To" defaultValue={filter.to?.slice(0, 10) ?? ''} />
        <Button type="submit" variant="primary">
          Filter
        </Button>
        <Button type="button" onClick={() => setParams(new URLSearchParams())}>
          Clear
        </Button>
      </form>
      {audit.isPending ? (
        <TableSkeleton label="Loading the audit log" />
      ) : audit.isError ? (
        <ErrorView error={audit.error} />
      ) : (
        <>
          <DataTable
            caption="Audit events, newest first"
            columns={columns}
            rows={audit.data.items}
            rowKey={(e) => e.id}
            empty="No events match."
          />
          <Pagination
            page={audit.data.page}
            pageSize={audit.data.pageSize}
            total={audit.data.total}
            onPage={(p) => {
              const next = new URLSearchParams(params);
              next.set('page', String(p));
              setParams(next);
            }}
            label="Audit pages"
          />
        </>
      )}
    </>
  );
}
