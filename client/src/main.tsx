import '@mantine/core/styles.css';
import '@mantine/notifications/styles.css';
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/inter/700.css';
import './styles/tones.css';
import './styles/a11y.css';
import './lib/dates';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';
import { AppProvider } from './app/provider';
import { createRouter } from './app/router';
import { createQueryClient } from './lib/query-client';
import { meQueryKey } from './lib/query-keys';
import { setUnauthorizedHandler } from './lib/api-client';
import { paths } from './config/paths';

const queryClient = createQueryClient();
const router = createRouter(queryClient);

// A 401 anywhere (expired or ended session) sends the user to sign in, then back.
setUnauthorizedHandler(() => {
  queryClient.setQueryData(meQueryKey, null);
  const here = window.location.pathname + window.location.search;
  if (!here.startsWith(paths.signIn.path)) void router.navigate(paths.signIn.href(here));
});

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
