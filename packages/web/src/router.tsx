import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router-dom';
import { isApiError } from './api/ApiError';
import { meQueryOptions } from './api/auth';
import { sheetQueryOptions } from './api/sheets';
import { AppShell } from './components/AppShell';
import { Loading } from './components/Loading';
import { PublicLayout } from './components/PublicLayout';
import { RootLayout } from './components/RootLayout';
import {
  FrameErrorBoundary,
  PublicRouteErrorBoundary,
  RootErrorBoundary,
  RouteErrorBoundary,
} from './components/RouteErrorBoundary';
import { signInPathFor } from './lib/safeNextPath';

/**
 * The route table. Layouts are loaded with the app; every page is a lazy module under routes/,
 * fetched when first visited. Pages inside the shell share its error boundary, so an API error
 * is shown in place of the page while the navigation stays usable.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  /** The shell's gate: a 401 from /api/auth/me sends the visitor to sign in, then back here. */
  async function requireSignedIn({ request }: LoaderFunctionArgs) {
    try {
      await queryClient.ensureQueryData(meQueryOptions());
      return null;
    } catch (error) {
      if (isApiError(error) && error.status === 401) {
        const url = new URL(request.url);
        throw redirect(signInPathFor(url.pathname + url.search));
      }
      throw error;
    }
  }

  return [
    {
      id: 'root',
      element: <RootLayout />,
      errorElement: <RootErrorBoundary />,
      HydrateFallback: () => <Loading what="Sheaf" />,
      children: [
        {
          element: <PublicLayout />,
          errorElement: <FrameErrorBoundary />,
          children: [
            {
              errorElement: <PublicRouteErrorBoundary />,
              children: [
                {
                  path: 'signin',
                  lazy: () =>
                    import('./routes/SignInPage').then((m) => ({ Component: m.SignInPage })),
                },
                {
                  path: 'signup',
                  lazy: () =>
                    import('./routes/SignUpPage').then((m) => ({ Component: m.SignUpPage })),
                },
                {
                  path: 'reset',
                  lazy: () =>
                    import('./routes/ResetRequestPage').then((m) => ({
                      Component: m.ResetRequestPage,
                    })),
                },
                {
                  path: 'reset/:token',
                  lazy: () =>
                    import('./routes/ResetConfirmPage').then((m) => ({
                      Component: m.ResetConfirmPage,
                    })),
                },
                {
                  path: 'invite/:token',
                  lazy: () =>
                    import('./routes/InvitationPage').then((m) => ({
                      Component: m.InvitationPage,
                    })),
                },
              ],
            },
          ],
        },
        {
          id: 'shell',
          loader: requireSignedIn,
          element: <AppShell />,
          errorElement: <FrameErrorBoundary />,
          children: [
            {
              errorElement: <RouteErrorBoundary />,
              children: [
                { index: true, loader: () => redirect('/sheets') },
                {
                  path: 'sheets',
                  lazy: () =>
                    import('./routes/SheetsPage').then((m) => ({ Component: m.SheetsPage })),
                },
                {
                  path: 'sheets/:sheetId',
                  // Ask for the sheet while the page's code loads, not after.
                  loader: ({ params }) => {
                    void queryClient.prefetchQuery(sheetQueryOptions(params.sheetId ?? ''));
                    return null;
                  },
                  lazy: () =>
                    import('./routes/SheetPage').then((m) => ({ Component: m.SheetPage })),
                },
                {
                  path: 'sheets/:sheetId/revisions',
                  lazy: () =>
                    import('./routes/RevisionsPage').then((m) => ({ Component: m.RevisionsPage })),
                },
                {
                  path: 'sheets/:sheetId/revisions/:number',
                  lazy: () =>
                    import('./routes/RevisionPage').then((m) => ({ Component: m.RevisionPage })),
                },
                {
                  path: 'sheets/:sheetId/history',
                  lazy: () =>
                    import('./routes/SheetHistoryPage').then((m) => ({
                      Component: m.SheetHistoryPage,
                    })),
                },
                {
                  path: 'sheets/:sheetId/save-as-template',
                  lazy: () =>
                    import('./routes/SaveAsTemplatePage').then((m) => ({
                      Component: m.SaveAsTemplatePage,
                    })),
                },
                {
                  path: 'templates',
                  lazy: () =>
                    import('./routes/TemplatesPage').then((m) => ({ Component: m.TemplatesPage })),
                },
                {
                  path: 'templates/:templateId',
                  lazy: () =>
                    import('./routes/TemplatePage').then((m) => ({ Component: m.TemplatePage })),
                },
                {
                  path: 'templates/:templateId/new',
                  lazy: () =>
                    import('./routes/NewSheetFromTemplatePage').then((m) => ({
                      Component: m.NewSheetFromTemplatePage,
                    })),
                },
                {
                  path: 'materials',
                  lazy: () =>
                    import('./routes/MaterialsPage').then((m) => ({ Component: m.MaterialsPage })),
                },
                {
                  path: 'projects',
                  lazy: () =>
                    import('./routes/ProjectsPage').then((m) => ({ Component: m.ProjectsPage })),
                },
                {
                  path: 'projects/:projectId',
                  lazy: () =>
                    import('./routes/ProjectPage').then((m) => ({ Component: m.ProjectPage })),
                },
                {
                  path: 'members',
                  lazy: () =>
                    import('./routes/MembersPage').then((m) => ({ Component: m.MembersPage })),
                },
                {
                  path: 'profile',
                  lazy: () =>
                    import('./routes/ProfilePage').then((m) => ({ Component: m.ProfilePage })),
                },
                {
                  path: 'organizations/new',
                  lazy: () =>
                    import('./routes/NewOrganizationPage').then((m) => ({
                      Component: m.NewOrganizationPage,
                    })),
                },
              ],
            },
          ],
        },
        {
          path: '*',
          lazy: () => import('./routes/NotFoundPage').then((m) => ({ Component: m.NotFoundPage })),
        },
      ],
    },
  ];
}
