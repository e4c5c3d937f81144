import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { getTallyQueryOptions } from '@/features/tallies/api';
import { parseTallyId } from '@/features/tally-review/tally-id';
import { requireAccess, routeAccess, type AccessHandle } from './route-access';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AccountRoute } from './routes/account';
import { AppRoot } from './routes/app-root';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { networkLoader, NetworkRoute } from './routes/network';
import { NotFoundRoute } from './routes/not-found';
import { PublicRoot } from './routes/public-root';
import { ResetPasswordRoute } from './routes/reset-password';
import { RootRoute, rootLoader } from './routes/root';
import { RouteErrorPage } from './routes/route-error';
import { signInLoader, SignInRoute } from './routes/sign-in';
import { StatusRoute } from './routes/status';

/**
 * The route tree, shared by the browser router and the tests' memory router.
 * The root settles the session first; the pages used without one sit in the quiet public
 * frame, every other page in the shell, guarded by the policy it declares in `handle`.
 * Each page has its own error element so a broken page keeps the shell and its navigation.
 */
export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const pageError = <RouteErrorPage />;
  return [
    {
      path: paths.network.path,
      element: <RootRoute />,
      loader: rootLoader,
      errorElement: <RouteErrorPage standalone />,
      // Shown while the session is restored and the first loaders return, on a cold start only.
      hydrateFallbackElement: <LoadingState label="Opening Tallyloom…" />,
      children: [
        {
          element: <PublicRoot />,
          children: [
            {
              path: paths.signIn.path,
              element: <SignInRoute />,
              loader: signInLoader,
              errorElement: pageError,
            },
            {
              path: paths.forgotPassword.path,
              element: <ForgotPasswordRoute />,
              errorElement: pageError,
            },
            {
              path: paths.resetPassword.path,
              element: <ResetPasswordRoute />,
              errorElement: pageError,
            },
            {
              path: paths.acceptInvitation.path,
              element: <AcceptInvitationRoute />,
              errorElement: pageError,
            },
            {
              // The shareable campaign page: no session needed, counts only.
              path: paths.publicProgress.path,
              lazy: async () => ({
                Component: (await import('./routes/public-progress')).PublicProgressRoute,
              }),
              errorElement: pageError,
            },
          ],
        },
        {
          element: <AppRoot />,
          children: [
            {
              index: true,
              element: <NetworkRoute />,
              loader: requireAccess(routeAccess.network, networkLoader(queryClient)),
              errorElement: pageError,
              handle: { access: routeAccess.network } satisfies AccessHandle,
            },
            {
              path: paths.status.path,
              element: <StatusRoute />,
              loader: requireAccess(routeAccess.status),
              errorElement: pageError,
              handle: { access: routeAccess.status } satisfies AccessHandle,
            },
            {
              path: paths.people.path,
              // Only admins use these two pages: their code loads when first opened.
              lazy: async () => ({ Component: (await import('./routes/people')).PeopleRoute }),
              loader: requireAccess(routeAccess.people),
              errorElement: pageError,
              handle: { access: routeAccess.people } satisfies AccessHandle,
            },
            {
              path: paths.setup.path,
              // Only admins set up the network: the layout and each part load when first opened.
              lazy: async () => ({ Component: (await import('./routes/setup')).SetupRoute }),
              loader: requireAccess(routeAccess.setup),
              errorElement: pageError,
              handle: { access: routeAccess.setup } satisfies AccessHandle,
              children: [
                {
                  index: true,
                  lazy: async () => ({
                    Component: (await import('./routes/setup-regions')).SetupRegionsRoute,
                  }),
                  errorElement: pageError,
                },
                {
                  path: paths.setupAgencies.path,
                  lazy: async () => ({
                    Component: (await import('./routes/setup-agencies')).SetupAgenciesRoute,
                  }),
                  errorElement: pageError,
                },
                {
                  path: paths.setupCampaigns.path,
                  lazy: async () => ({
                    Component: (await import('./routes/setup-campaigns')).SetupCampaignsRoute,
                  }),
                  errorElement: pageError,
                },
                {
                  path: paths.setupBlanketSizes.path,
                  lazy: async () => ({
                    Component: (await import('./routes/setup-blanket-sizes'))
                      .SetupBlanketSizesRoute,
                  }),
                  errorElement: pageError,
                },
                {
                  path: paths.setupSettings.path,
                  lazy: async () => ({
                    Component: (await import('./routes/setup-settings')).SetupSettingsRoute,
                  }),
                  errorElement: pageError,
                },
              ],
            },
            {
              path: paths.outbox.path,
              lazy: async () => ({ Component: (await import('./routes/outbox')).OutboxRoute }),
              loader: requireAccess(routeAccess.outbox),
              errorElement: pageError,
              handle: { access: routeAccess.outbox } satisfies AccessHandle,
            },
            {
              path: paths.receipts.path,
              // The parcel pages load when first opened: the form and detail are the heavy ones.
              lazy: async () => ({ Component: (await import('./routes/receipts')).ReceiptsRoute }),
              loader: requireAccess(routeAccess.receipts),
              // Filters, page and order change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.receipts } satisfies AccessHandle,
            },
            {
              path: paths.receiptNew.path,
              lazy: async () => ({
                Component: (await import('./routes/receipts-new')).ReceiptNewRoute,
              }),
              loader: requireAccess(routeAccess.receiptNew),
              errorElement: pageError,
              handle: { access: routeAccess.receiptNew } satisfies AccessHandle,
            },
            {
              path: paths.receiptImport.path,
              lazy: async () => ({
                Component: (await import('./routes/receipts-import')).ReceiptImportRoute,
              }),
              loader: requireAccess(routeAccess.receiptImport),
              errorElement: pageError,
              handle: { access: routeAccess.receiptImport } satisfies AccessHandle,
            },
            {
              path: paths.receipt.path,
              lazy: async () => ({
                Component: (await import('./routes/receipts-detail')).ReceiptDetailRoute,
              }),
              loader: requireAccess(routeAccess.receipt),
              errorElement: pageError,
              handle: { access: routeAccess.receipt } satisfies AccessHandle,
            },
            {
              path: paths.receiptEdit.path,
              lazy: async () => ({
                Component: (await import('./routes/receipts-edit')).ReceiptEditRoute,
              }),
              loader: requireAccess(routeAccess.receiptEdit),
              errorElement: pageError,
              handle: { access: routeAccess.receiptEdit } satisfies AccessHandle,
            },
            {
              path: paths.tallies.path,
              lazy: async () => ({ Component: (await import('./routes/tallies')).TalliesRoute }),
              loader: requireAccess(routeAccess.tallies),
              // Choosing a chapter changes only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.tallies } satisfies AccessHandle,
            },
            {
              path: paths.tally.path,
              // The form and its live checks are the heavy part: they load when first opened.
              lazy: async () => ({ Component: (await import('./routes/tally')).TallyRoute }),
              loader: requireAccess(routeAccess.tally),
              errorElement: pageError,
              handle: { access: routeAccess.tally } satisfies AccessHandle,
            },
            {
              path: paths.tallyReview.path,
              lazy: async () => ({
                Component: (await import('./routes/tally-review')).TallyReviewRoute,
              }),
              loader: requireAccess(routeAccess.tallyReview),
              // Filters, page and order change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.tallyReview } satisfies AccessHandle,
            },
            {
              path: paths.tallyReviewItem.path,
              // The review page carries the charts: ECharts loads with it, not with the app.
              lazy: async () => ({
                Component: (await import('./routes/tally-review-item')).TallyReviewItemRoute,
              }),
              // The tally is asked for while the page's code (and ECharts) still loads.
              loader: requireAccess(routeAccess.tallyReviewItem, ({ params }) => {
                const id = parseTallyId(params.id);
                if (id !== undefined) void queryClient.prefetchQuery(getTallyQueryOptions(id));
                return null;
              }),
              errorElement: pageError,
              handle: { access: routeAccess.tallyReviewItem } satisfies AccessHandle,
            },
            {
              path: paths.tallyRevisions.path,
              lazy: async () => ({
                Component: (await import('./routes/tally-revisions')).TallyRevisionsRoute,
              }),
              loader: requireAccess(routeAccess.tallyRevisions),
              // Choosing other revisions changes only the query string.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.tallyRevisions } satisfies AccessHandle,
            },
            {
              path: paths.dashboard.path,
              // The dashboards carry ECharts: it loads with them, not with the app.
              lazy: async () => ({
                Component: (await import('./routes/dashboard')).DashboardRoute,
              }),
              loader: requireAccess(routeAccess.dashboard),
              // The period changes only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.dashboard } satisfies AccessHandle,
            },
            {
              path: paths.dashboardRegion.path,
              lazy: async () => ({
                Component: (await import('./routes/dashboard-region')).DashboardRegionRoute,
              }),
              loader: requireAccess(routeAccess.dashboardRegion),
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.dashboardRegion } satisfies AccessHandle,
            },
            {
              path: paths.dashboardChapter.path,
              lazy: async () => ({
                Component: (await import('./routes/dashboard-chapter')).DashboardChapterRoute,
              }),
              loader: requireAccess(routeAccess.dashboardChapter),
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.dashboardChapter } satisfies AccessHandle,
            },
            {
              path: paths.campaigns.path,
              lazy: async () => ({
                Component: (await import('./routes/campaigns')).CampaignsRoute,
              }),
              loader: requireAccess(routeAccess.campaigns),
              errorElement: pageError,
              handle: { access: routeAccess.campaigns } satisfies AccessHandle,
            },
            {
              path: paths.campaign.path,
              lazy: async () => ({ Component: (await import('./routes/campaign')).CampaignRoute }),
              loader: requireAccess(routeAccess.campaign),
              errorElement: pageError,
              handle: { access: routeAccess.campaign } satisfies AccessHandle,
            },
            {
              path: paths.jobs.path,
              lazy: async () => ({ Component: (await import('./routes/jobs')).JobsRoute }),
              loader: requireAccess(routeAccess.jobs),
              errorElement: pageError,
              handle: { access: routeAccess.jobs } satisfies AccessHandle,
            },
            {
              path: paths.exports.path,
              lazy: async () => ({ Component: (await import('./routes/exports')).ExportsRoute }),
              loader: requireAccess(routeAccess.exports),
              // The page changes only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.exports } satisfies AccessHandle,
            },
            {
              path: paths.impactPack.path,
              lazy: async () => ({
                Component: (await import('./routes/impact-pack')).ImpactPackRoute,
              }),
              loader: requireAccess(routeAccess.impactPack),
              errorElement: pageError,
              handle: { access: routeAccess.impactPack } satisfies AccessHandle,
            },
            {
              path: paths.auditLog.path,
              lazy: async () => ({ Component: (await import('./routes/audit-log')).AuditLogRoute }),
              loader: requireAccess(routeAccess.auditLog),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.auditLog } satisfies AccessHandle,
            },
            {
              path: paths.trace.path,
              lazy: async () => ({ Component: (await import('./routes/trace')).TraceRoute }),
              loader: requireAccess(routeAccess.trace),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.trace } satisfies AccessHandle,
            },
            {
              path: paths.samples.path,
              lazy: async () => ({ Component: (await import('./routes/samples')).SamplesRoute }),
              loader: requireAccess(routeAccess.samples),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.samples } satisfies AccessHandle,
            },
            {
              path: paths.sample.path,
              lazy: async () => ({ Component: (await import('./routes/sample')).SampleRoute }),
              loader: requireAccess(routeAccess.sample),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.sample } satisfies AccessHandle,
            },
            {
              path: paths.findings.path,
              lazy: async () => ({ Component: (await import('./routes/findings')).FindingsRoute }),
              loader: requireAccess(routeAccess.findings),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.findings } satisfies AccessHandle,
            },
            {
              path: paths.finding.path,
              lazy: async () => ({ Component: (await import('./routes/finding')).FindingRoute }),
              loader: requireAccess(routeAccess.finding),
              // Filters and pages change only the query string: nothing for the guard to redo.
              shouldRevalidate: ({ currentUrl, nextUrl }) =>
                currentUrl.pathname !== nextUrl.pathname,
              errorElement: pageError,
              handle: { access: routeAccess.finding } satisfies AccessHandle,
            },
            {
              path: paths.account.path,
              element: <AccountRoute />,
              loader: requireAccess(routeAccess.account),
              errorElement: pageError,
              handle: { access: routeAccess.account } satisfies AccessHandle,
            },
          ],
        },
        { path: '*', element: <NotFoundRoute />, errorElement: pageError },
      ],
    },
  ];
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createBrowserRouter(createAppRoutes(queryClient)), [queryClient]);
  return <RouterProvider router={router} />;
}
