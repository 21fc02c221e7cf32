import { Link, useSearchParams } from 'react-router-dom';
import { useAudit, type AuditFilter } from '../api/admin';
import { query } from '../api/client';
import { useProjects } from '../api/projects';
import { useMe } from '../api/session';
import { AUDIT_ACTIONS, type AuditEvent } from '@hoopline/contract';
import {
  AUDIT_ACTION_LABELS,
  auditActionLabel,
  auditSegments,
  isoDateTime,
  type AuditLink,
} from '@hoopline/present';
import { Button, buttonClass } from '../components/button';
import { DataTable, Pagination, type Column } from '../components/data-table';
import { ErrorView, NotFoundView } from '../components/error-view';
import { SelectField, TextField } from '../components/field';
import { PageHeader } from '../components/page';
import { TableSkeleton } from '../components/skeleton';

const ENTITY_TYPES = [
  'user',
  'invitation',
  'project',
  'member',
  'material',
  'component',
  'revision',
  'attachment',
  'settings',
];

/** Where a record of an event's sentence links: its page, or for a person their events. */
function hrefOf(link: AuditLink): string {
  switch (link.kind) {
    case 'project':
      return `/projects/${link.id}`;
    case 'component':
      return `/components/${link.id}`;
    case 'revision':
      return `/revisions/${link.id}`;
    case 'person':
      return `/audit-log?actorId=${encodeURIComponent(link.id)}`;
  }
}

/** The event in words (packages/present), each record's name a link. */
function EventWords({ event }: { event: AuditEvent }) {
  return (
    <span>
      {auditSegments(event).map((s, i) =>
        s.link ? (
          <Link
            key={i}
            to={hrefOf(s.link)}
            className="text-accent underline"
            title={s.link.kind === 'person' ? `Events by ${s.text}` : undefined}
          >
            {s.text}
          </Link>
        ) : (
          <span key={i}>{s.text}</span>
        ),
      )}
    </span>
  );
}

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
  const projects = useProjects({ sort: 'number', order: 'asc', pageSize: 100 });
  if (!me.user.isAdmin) return <NotFoundView />;
  // The export takes the same filters, without the page.
  const csvHref = `/api/audit.csv${query({ ...filter, page: undefined })}`;

  const columns: Column<AuditEvent>[] = [
    {
      key: 'when',
      header: 'When (UTC)',
      numeric: true,
      render: (e) => (
        <time dateTime={e.createdAt} className="font-mono text-xs whitespace-nowrap">
          {isoDateTime(e.createdAt)}
        </time>
      ),
    },
    {
      key: 'event',
      header: 'Event',
      render: (e) => <EventWords event={e} />,
    },
    {
      key: 'action',
      header: 'Action',
      render: (e) => (
        <span title={e.action}>
          {auditActionLabel(e.action)}{' '}
          <span className="font-mono text-xs text-muted">{e.action}</span>
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
          for (const key of ['projectId', 'action', 'entityType', 'actorId', 'from', 'to']) {
            const value = String(data.get(key) ?? '').trim();
            if (value)
              next.set(key, key === 'from' || key === 'to' ? new Date(value).toISOString() : value);
          }
          setParams(next);
        }}
      >
        <SelectField name="projectId" label="Project" defaultValue={filter.projectId ?? ''}>
          <option value="">All projects</option>
          {projects.data?.items.map((p) => (
            <option key={p.id} value={p.id}>
              {p.number} {p.name}
            </option>
          ))}
          {filter.projectId &&
          projects.data &&
          !projects.data.items.some((p) => p.id === filter.projectId) ? (
            <option value={filter.projectId}>{filter.projectId}</option>
          ) : null}
        </SelectField>
        <SelectField name="action" label="Action" defaultValue={filter.action ?? ''}>
          <option value="">Any</option>
          {AUDIT_ACTIONS.map((code) => (
            <option key={code} value={code}>
              {AUDIT_ACTION_LABELS[code]}
            </option>
          ))}
          {filter.action && !(AUDIT_ACTIONS as readonly string[]).includes(filter.action) ? (
            <option value={filter.action}>{filter.action}</option>
          ) : null}
        </SelectField>
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
        {filter.actorId ? <input type="hidden" name="actorId" value={filter.actorId} /> : null}
        <Button type="submit" variant="primary">
          Filter
        </Button>
        <Button type="button" onClick={() => setParams(new URLSearchParams())}>
          Clear
        </Button>
        <a href={csvHref} download className={buttonClass('secondary')}>
          Download CSV
        </a>
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
