import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { createAppQueryClient } from './api/queryClient';
import { signInPathFor } from './lib/safeNextPath';
import { createRoutes } from './router';
import './styles/app.css';
import './styles/print.css';

const queryClient = createAppQueryClient({
  // A request made on the user's behalf answered 401: the session ended (expired, signed out
  // in another tab). Send them to sign in and bring them back to where they were.
  onUnauthorized: () => {
    const { pathname, search } = window.location;
    if (pathname.startsWith('/signin')) return;
    queryClient.removeQueries();
    void router.navigate(signInPathFor(pathname + search));
  },
});
const router = createBrowserRouter(createRoutes(queryClient));

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

createRoot(container).render(
  <StrictMode>
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
