import '@fontsource/work-sans/400.css';
import '@fontsource/work-sans/500.css';
import '@fontsource/work-sans/600.css';
import '@fontsource/work-sans/700.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProviders } from './app/providers';
import { createQueryClient } from './app/query-client';
import { NewVersionNotice } from './app/new-version-notice';
import { createAppRouter } from './app/router';

const queryClient = createQueryClient();
const router = createAppRouter();
const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
      <NewVersionNotice />
    </AppProviders>
  </StrictMode>,
);
