import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

export interface Crumb {
  readonly label: string;
  readonly to?: string;
}

/** Crumbs down to a project, then the page's own. */
export function projectCrumbs(
  project: { readonly id: string; readonly number: string; readonly name: string },
  ...rest: readonly Crumb[]
): Crumb[] {
  return [
    { label: 'Projects', to: '/projects' },
    { label: `${project.number} ${project.name}`, to: `/projects/${project.id}` },
    ...rest,
  ];
}

/** Crumbs down to a component in its project, then the page's own. */
export function componentCrumbs(
  project: { readonly id: string; readonly number: string; readonly name: string },
  component: { readonly id: string; readonly name: string },
  ...rest: readonly Crumb[]
): Crumb[] {
  return projectCrumbs(
    project,
    { label: component.name, to: `/components/${component.id}` },
    ...rest,
  );
}

export function PageHeader({
  title,
  subtitle,
  crumbs,
  actions,
}: {
  title: ReactNode;
  subtitle?: ReactNode;
  crumbs?: readonly Crumb[];
  actions?: ReactNode;
}) {
  return (
    <header className="mb-4 flex flex-wrap items-end justify-between gap-3">
      <div className="min-w-0">
        {crumbs && crumbs.length > 0 ? (
          <nav aria-label="Breadcrumb" className="mb-1 text-xs text-muted">
            <ol className="flex flex-wrap items-center gap-1">
              {crumbs.map((crumb, i) => (
                <li key={`${crumb.label}-${i}`} className="flex items-center gap-1">
                  {i > 0 ? <span aria-hidden="true">/</span> : null}
                  {crumb.to ? (
                    <Link to={crumb.to} className="hover:text-ink hover:underline">
                      {crumb.label}
                    </Link>
                  ) : (
                    <span aria-current="page">{crumb.label}</span>
                  )}
                </li>
              ))}
            </ol>
          </nav>
        ) : null}
        <h1 className="truncate text-xl font-semibold tracking-tight">{title}</h1>
        {subtitle ? <p className="mt-0.5 text-sm text-muted">{subtitle}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
    </header>
  );
}

export function Panel({
  title,
  actions,
  children,
  className = '',
  id,
}: {
  title?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  id?: string;
}) {
  return (
    <section
      aria-labelledby={title && id ? `${id}-title` : undefined}
      className={`rounded-md border border-line bg-panel ${className}`}
    >
      {title ? (
        <div className="flex items-center justify-between gap-2 border-b border-line px-3 py-2">
          <h2 id={id ? `${id}-title` : undefined} className="text-sm font-semibold">
            {title}
          </h2>
          {actions}
        </div>
      ) : null}
      <div className="p-3">{children}</div>
    </section>
  );
}
