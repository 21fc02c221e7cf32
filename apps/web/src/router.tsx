import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { RouteErrorBoundary } from './components/error-view';
import { AppLayout } from './routes/app-layout';
import { requireSession, redirectIfSignedIn } from './routes/guards';
import { SignInRoute } from './routes/sign-in';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { RequestResetRoute, CompleteResetRoute } from './routes/reset-password';
import { ProjectsRoute } from './routes/projects';
import { NewProjectRoute } from './routes/project-new';
import { ProjectRoute } from './routes/project';
import { ProjectSettingsRoute } from './routes/project-settings';
import { ProjectMembersRoute } from './routes/project-members';
import { NewComponentRoute } from './routes/component-new';
import { ComponentRoute } from './routes/component';
import { RevisionsRoute } from './routes/revisions';
import { CompareRoute } from './routes/compare';
import { RevisionRoute } from './routes/revision';
import { CheckQueueRoute } from './routes/check-queue';
import { IssuedRoute } from './routes/issued';
import { PeopleRoute } from './routes/people';
import { AuditLogRoute } from './routes/audit-log';
import { AccountRoute } from './routes/account';
import { NotFoundRoute } from './routes/not-found';
import { VerifyRoute } from './routes/verify';

export const routes: RouteObject[] = [
  {
    errorElement: <RouteErrorBoundary />,
    children: [
      { path: '/sign-in', loader: redirectIfSignedIn, element: <SignInRoute /> },
      { path: '/invitation/:token', element: <AcceptInvitationRoute /> },
      { path: '/reset-password', element: <RequestResetRoute /> },
      { path: '/reset-password/:token', element: <CompleteResetRoute /> },
      // Public: what a sheet's QR code opens; no sign-in, no app navigation.
      { path: '/verify', element: <VerifyRoute /> },
      { path: '/verify/:code', element: <VerifyRoute /> },
      {
        path: '/',
        id: 'session',
        loader: requireSession,
        element: <AppLayout />,
        errorElement: <RouteErrorBoundary />,
        children: [
          {
            errorElement: <RouteErrorBoundary />,
            children: [
              { index: true, element: <Navigate to="/projects" replace /> },
              { path: 'projects', element: <ProjectsRoute /> },
              { path: 'projects/new', element: <NewProjectRoute /> },
              { path: 'projects/:projectId', element: <ProjectRoute /> },
              { path: 'projects/:projectId/settings', element: <ProjectSettingsRoute /> },
              { path: 'projects/:projectId/members', element: <ProjectMembersRoute /> },
              { path: 'projects/:projectId/components/new', element: <NewComponentRoute /> },
              { path: 'components/:componentId', element: <ComponentRoute /> },
              { path: 'components/:componentId/revisions', element: <RevisionsRoute /> },
              { path: 'components/:componentId/compare', element: <CompareRoute /> },
              { path: 'revisions/:revisionId', element: <RevisionRoute /> },
              { path: 'check-queue', element: <CheckQueueRoute /> },
              { path: 'issued', element: <IssuedRoute /> },
              { path: 'people', element: <PeopleRoute /> },
              { path: 'audit-log', element: <AuditLogRoute /> },
              { path: 'account', element: <AccountRoute /> },
              { path: '*', element: <NotFoundRoute /> },
            ],
          },
        ],
      },
    ],
  },
];

export const router = createBrowserRouter(routes);
