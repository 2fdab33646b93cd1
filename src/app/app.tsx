import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { setUnauthenticatedHandler } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { paths } from '@/config/paths';
import { router } from './router';

// A 401 anywhere means the session ended: forget the user and go to sign-in.
setUnauthenticatedHandler(() => {
  queryClient.setQueryData(meQueryOptions().queryKey, null);
  if (!window.location.pathname.startsWith(paths.login)) {
    router.navigate(`${paths.login}?next=${encodeURIComponent(window.location.pathname)}`);
  }
});

export function App() {
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
