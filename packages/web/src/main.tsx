import '@fontsource/roboto/400.css';
import '@fontsource/roboto/500.css';
import '@fontsource/roboto/700.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from '@/app/provider';
import { AppRouter } from '@/app/router';
import { queryClient } from '@/lib/query-client';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element to mount Tallyloom into.');

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
