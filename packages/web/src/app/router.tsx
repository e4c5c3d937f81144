import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { AppRoot } from './routes/app-root';
import { networkLoader, NetworkRoute } from './routes/network';
import { NotFoundRoute } from './routes/not-found';
import { RouteErrorPage } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { StatusRoute } from './routes/status';

/**
 * The route tree, shared by the browser router and the tests' memory router.
 * Each page has its own error element so a broken page keeps the shell and its navigation.
 */
export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const pageError = <RouteErrorPage />;
  return [
    {
      path: paths.network.path,
      element: <AppRoot />,
      errorElement: <RouteErrorPage standalone />,
      // Shown for the moment before the first loaders return, on a cold start only.
      hydrateFallbackElement: <LoadingState label="Opening Tallyloom…" />,
      children: [
        {
          index: true,
          element: <NetworkRoute />,
          loader: networkLoader(queryClient),
          errorElement: pageError,
        },
        { path: paths.status.path, element: <StatusRoute />, errorElement: pageError },
        { path: paths.signIn.path, element: <SignInRoute />, errorElement: pageError },
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
