// First: before any module makes a zod schema (see the file).
import './lib/zod-jitless';
import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { queryClient } from './api/query-client';
import { applyTheme, watchSystemTheme } from './lib/theme';
import { router } from './router';
import './styles.css';

applyTheme();
watchSystemTheme();

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
