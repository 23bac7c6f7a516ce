import { BlueprintProvider } from '@blueprintjs/core';
import { type QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { type DataRouter, RouterProvider } from 'react-router';

/** Providers around the router: server state, and Blueprint's hotkeys, overlays and portals. */
export function App({ queryClient, router }: { queryClient: QueryClient; router: DataRouter }) {
  return (
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <RouterProvider router={router} />
      </BlueprintProvider>
    </QueryClientProvider>
  );
}
