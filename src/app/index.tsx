import { QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';
import { RouterProvider } from 'react-router';
import { meQueryOptions } from '../features/auth/api/get-me';
import { createQueryClient } from '../lib/query-client';
import { createAppRouter } from './router';

function createClientAndRouter() {
  const queryClient = createQueryClient({
    // The session ended under the page: re-read who is signed in; the shell then sends them to sign-in.
    onUnauthenticated: (client) => void client.invalidateQueries({ queryKey: meQueryOptions().queryKey }),
  });
  return { queryClient, router: createAppRouter(queryClient) };
}

export function App() {
  const [{ queryClient, router }] = useState(createClientAndRouter);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
