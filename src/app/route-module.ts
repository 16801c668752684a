import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import type { LoaderFunction } from 'react-router';

/** What every lazily loaded route module in `app/routes` exports. */
export type RouteModule = {
  Component: ComponentType;
  ErrorBoundary?: ComponentType;
  /** Builds the route's loader around the app's one QueryClient (loaders only warm its cache). */
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
};

/** Turns a route module into the properties React Router's `lazy` expects. */
export function toLazyRoute(queryClient: QueryClient) {
  return ({ Component, ErrorBoundary, clientLoader }: RouteModule) => ({
    Component,
    ...(ErrorBoundary ? { ErrorBoundary } : {}),
    ...(clientLoader ? { loader: clientLoader(queryClient) } : {}),
  });
}
