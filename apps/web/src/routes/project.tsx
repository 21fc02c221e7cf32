import { useParams } from 'react-router-dom';
import { useComponentTable } from '../api/components';
import { useProject } from '../api/projects';
import type { UnitSystem } from '@hoopline/contract';
import { RoleBadge } from '../components/badges';
import { ButtonLink } from '../components/button';
import { ErrorView } from '../components/error-view';
import { PageHeader } from '../components/page';
import { PageSkeleton, TableSkeleton } from '../components/skeleton';
import { ComponentTableView } from '../features/projects/component-table';
import { ProjectDownloads } from '../features/sheets/package-download';
import { show } from '@hoopline/present';
import { useUnitSystem, useProjectUnits } from '../lib/unit-system';
import { useMe } from '../api/session';

function siteText(site: unknown, system: UnitSystem): string {
  const s = (site ?? {}) as { altitude?: number; ambientPressure?: number };
  if (s.altitude !== undefined) return `standard atmosphere at ${show(s.altitude, 'm', system)}`;
  if (s.ambientPressure !== undefined) return 'given';
  return 'standard atmosphere at sea level';
}

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  const me = useMe();
  const system = useUnitSystem();
  const project = useProject(projectId);
  // A project's unit system is the default display on its pages (lib/unit-system).
  useProjectUnits(project.data?.unitSystem);
  const table = useComponentTable(projectId);

  if (project.isPending) return <PageSkeleton label="Loading the project" />;
  if (project.isError) return <ErrorView error={project.error} />;
  const p = project.data;
  const isDesigner = p.myRole === 'designer';
  const canManage = isDesigner || me.user.isAdmin;

  return (
    <>
      <PageHeader
        crumbs={[{ label: 'Projects', to: '/projects' }, { label: p.number }]}
        title={`${p.number} ${p.name}`}
        subtitle={
          <>
            {p.client ? `${p.client} · ` : ''}Ambient {show(p.ambientPressure, 'Pa', system)} (
            {siteText(p.site, system)}
            {p.designBasis?.barometer === 'high' ? ', designed for a high barometer' : ''}) ·{' '}
            {p.designBasis?.allowableStress === 'en-13445-3' ? 'EN 13445-3' : 'ASME VIII-1'} basis ·{' '}
            {p.designTemperature != null
              ? `design temperature ${typeof p.designTemperature === 'number' ? `${p.designTemperature} K` : p.designTemperature} · `
              : ''}
            {p.unitSystem === 'si' ? 'SI' : 'US customary'} · my role: <RoleBadge role={p.myRole} />
          </>
        }
        actions={
          <>
            <ButtonLink to={`/projects/${p.id}/members`}>Members</ButtonLink>
            {canManage ? <ButtonLink to={`/projects/${p.id}/settings`}>Settings</ButtonLink> : null}
            {isDesigner ? (
              <ButtonLink to={`/projects/${p.id}/components/new`} variant="primary">
                New component
              </ButtonLink>
            ) : null}
          </>
        }
      />
      {p.notes ? (
        <p className="mb-3 max-w-3xl whitespace-pre-line text-sm text-muted">{p.notes}</p>
      ) : null}
      <h2 className="mb-2 text-sm font-semibold">Components</h2>
      {table.isPending ? (
        <TableSkeleton label="Loading components" />
      ) : table.isError ? (
        <ErrorView error={table.error} />
      ) : (
        <>
          <ProjectDownloads
            unitSystem={p.unitSystem}
            projectId={p.id}
            hasIssued={table.data.rows.some((r) => r.issuedRevisionNumber !== null)}
          />
          <ComponentTableView
            table={table.data}
            empty={
              p.myRole === 'fabricator'
                ? 'No component of this project has been issued yet.'
                : isDesigner
                  ? 'No components yet. Add a door, cover, window or shell with "New component".'
                  : 'No components yet.'
            }
          />
          <p className="mt-2 text-xs text-muted">
            Governing check, utilisation and verdict are those of each revision&apos;s stored
            report, as it was countersigned or saved; nothing is screened again here.
          </p>
        </>
      )}
    </>
  );
}
