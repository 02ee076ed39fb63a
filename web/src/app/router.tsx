import type { ComponentType } from 'react';
import { createBrowserRouter, type LoaderFunction } from 'react-router-dom';
import { paths } from '@/config/paths';
import { setUnauthorizedHandler } from '@/lib/api-client';
import type { Role } from '@/lib/session';
import { HomeRedirect } from './home-redirect';
import { AppShell, type ShellHandle } from './layout/app-shell';
import { NotFound } from './not-found';
import { RequireRole } from './require-role';
import { RouteError } from './route-error';

interface RouteModule {
  Component: ComponentType;
  loader?: LoaderFunction;
}

/** A lazily loaded route module (its own chunk), wrapped in the role guard. */
function guarded(load: () => Promise<RouteModule>, roles?: readonly Role[]) {
  return async () => {
    const module = await load();
    const Page = module.Component;
    return {
      loader: module.loader,
      Component: () => (
        <RequireRole roles={roles}>
          <Page />
        </RequireRole>
      ),
    };
  };
}

const WORKERS: readonly Role[] = ['checker', 'consultant'];

export const router = createBrowserRouter([
  {
    path: paths.signIn.path,
    lazy: () => import('@/features/auth/routes/sign-in'),
    errorElement: <RouteError />,
  },
  {
    path: paths.invitation.path,
    lazy: () => import('@/features/auth/routes/invitation'),
    errorElement: <RouteError />,
  },
  {
    path: '/',
    element: (
      <RequireRole>
        <AppShell />
      </RequireRole>
    ),
    errorElement: <RouteError />,
    children: [
      { index: true, element: <HomeRedirect /> },
      { path: paths.projects.path, lazy: guarded(() => import('@/features/projects/routes/projects')) },
      {
        path: paths.project.path,
        lazy: guarded(() => import('@/features/projects/routes/project-overview')),
      },
      { path: paths.upload.path, lazy: guarded(() => import('@/features/upload/routes/upload'), WORKERS) },
      { path: paths.submittal.path, lazy: guarded(() => import('@/features/submittals/routes/submittal')) },
      { path: paths.report.path, lazy: guarded(() => import('@/features/submittals/routes/report')) },
      {
        path: paths.discrepancies.path,
        handle: { layout: 'workspace' } satisfies ShellHandle,
        lazy: guarded(() => import('@/features/discrepancies/routes/discrepancies')),
      },
      {
        path: paths.discrepancy.path,
        lazy: guarded(() => import('@/features/discrepancies/routes/discrepancy')),
      },
      { path: paths.dashboard.path, lazy: guarded(() => import('@/features/dashboard/routes/dashboard')) },
      { path: paths.admin.path, lazy: guarded(() => import('@/features/admin/routes/admin'), ['admin']) },
      { path: paths.account.path, lazy: guarded(() => import('@/features/account/routes/account')) },
      { path: paths.mailbox.path, lazy: guarded(() => import('@/features/mailbox/routes/mailbox')) },
      {
        path: paths.notifications.path,
        lazy: guarded(() => import('@/features/notifications/routes/notifications')),
      },
      { path: '*', element: <NotFound /> },
    ],
  },
]);

// A refused session (401) sends the user to sign in, then back to where they were.
setUnauthorizedHandler(() => {
  const { pathname, search } = router.state.location;
  if (pathname !== paths.signIn.path)
    void router.navigate(paths.signIn.getHref(`${pathname}${search}`), { replace: true });
});
