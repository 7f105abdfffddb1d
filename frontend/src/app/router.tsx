import type { FetchQueryOptions, QueryKey } from '@tanstack/react-query';
import { createBrowserRouter, redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router-dom';
import { queryClient } from '@/app/queryClient';
import { routeIdsWellFormed, routePatterns } from '@/app/paths';
import { sessionStore } from '@/modules/auth/utils/sessionStore';
import { ageModelQueries } from '@/modules/age-model/hooks/ageModelQueries';
import { calibrationQueries } from '@/modules/calibration/hooks/calibrationQueries';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { recurrenceQueries } from '@/modules/recurrence/hooks/recurrenceQueries';
import { AppShell } from '@/modules/shell/components/AppShell';
import { siteQueries } from '@/modules/sites/hooks/siteQueries';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import { AgeModelPage } from '@/pages/age-model/AgeModelPage';
import { SignInPage } from '@/pages/auth/SignInPage';
import { CalibrationPage } from '@/pages/calibration/CalibrationPage';
import { NotFoundPage } from '@/pages/errors/NotFoundPage';
import { RouteErrorPage } from '@/pages/errors/RouteErrorPage';
import { LadderPage } from '@/pages/ladder/LadderPage';
import { ProjectListPage } from '@/pages/projects/ProjectListPage';
import { ProjectOverviewPage } from '@/pages/projects/ProjectOverviewPage';
import { RecurrencePage } from '@/pages/recurrence/RecurrencePage';
import { SitePage } from '@/pages/sites/SitePage';
import { ProjectAdminPage } from '@/pages/admin/ProjectAdminPage';
import { AcceptInvitationPage } from '@/pages/team/AcceptInvitationPage';
import { ForgotPasswordPage } from '@/pages/team/ForgotPasswordPage';
import { ResetPasswordPage } from '@/pages/team/ResetPasswordPage';
import { teamQueries } from '@/modules/team/hooks/teamQueries';

/**
 * Start a page's main query while the route changes, so its data is on the way before the page
 * renders (the page reads it with useSuspenseQuery). Signed out, there is nothing to fetch.
 */
function prefetch<TData, TKey extends QueryKey>(options: FetchQueryOptions<TData, Error, TData, TKey>): null {
  if (sessionStore.get()) void queryClient.prefetchQuery(options);
  return null;
}

/**
 * A loader that first refuses ids no record can have (`/projects/does-not-exist`) as not found,
 * at once, without asking the server.
 */
function withIds(load: (params: LoaderFunctionArgs['params']) => null) {
  return ({ params }: LoaderFunctionArgs) => {
    if (!routeIdsWellFormed(params)) throw new Response('Not Found', { status: 404 });
    return load(params);
  };
}

const errorElement = <RouteErrorPage />;

/**
 * Every route of the app. Patterns come from the path table (paths.ts); each route has an
 * error element so a failing page leaves the shell standing.
 */
const routes: RouteObject[] = [
  { path: routePatterns.signIn, element: <SignInPage />, errorElement },
  { path: routePatterns.acceptInvitation, element: <AcceptInvitationPage />, errorElement },
  { path: routePatterns.forgotPassword, element: <ForgotPasswordPage />, errorElement },
  { path: routePatterns.resetPassword, element: <ResetPasswordPage />, errorElement },
  {
    element: <AppShell />,
    errorElement,
    hydrateFallbackElement: <LoadingState />,
    children: [
      { path: routePatterns.root, loader: () => redirect(routePatterns.projects) },
      { path: routePatterns.projects, element: <ProjectListPage />, errorElement, loader: () => prefetch(projectQueries.list()) },
      {
        path: routePatterns.project,
        element: <ProjectOverviewPage />,
        errorElement,
        loader: withIds((params) => prefetch(projectQueries.overview(params.projectId ?? ''))),
      },
      {
        path: routePatterns.site,
        element: <SitePage />,
        errorElement,
        loader: withIds((params) => prefetch(siteQueries.column(params.projectId ?? '', params.siteId ?? ''))),
      },
      {
        path: routePatterns.ageModel,
        element: <AgeModelPage />,
        errorElement,
        loader: withIds((params) => prefetch(ageModelQueries.site(params.projectId ?? '', params.siteId ?? ''))),
      },
      {
        path: routePatterns.ladder,
        element: <LadderPage />,
        errorElement,
        loader: withIds((params) => prefetch(ladderQueries.ladder(params.projectId ?? ''))),
      },
      {
        path: routePatterns.recurrence,
        element: <RecurrencePage />,
        errorElement,
        loader: withIds((params) => prefetch(recurrenceQueries.setup(params.projectId ?? ''))),
      },
      {
        path: routePatterns.projectAdmin,
        element: <ProjectAdminPage />,
        errorElement,
        loader: withIds((params) => prefetch(teamQueries.team(params.projectId ?? ''))),
      },
      { path: routePatterns.calibrate, element: <CalibrationPage />, errorElement, loader: () => prefetch(calibrationQueries.curves()) },
      { path: '*', element: <NotFoundPage />, errorElement },
    ],
  },
];

export const router = createBrowserRouter(routes);
