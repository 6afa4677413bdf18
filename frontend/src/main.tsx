/// <reference types="vite-plugin-pwa/client" />
// First: on a run view it asks for the session and the run before the rest of the app evaluates.
import './early-requests';
import './index.css';

import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';

import { AppProvider } from './app/provider';
import { prefetchRunOfPage } from './features/run-view/run-view-routes';
import { createAppRouter } from './app/router';
import { cacheSessionForOffline } from './lib/offline-session';
import { createQueryClient } from './lib/query-client';

const queryClient = createQueryClient();
prefetchRunOfPage(queryClient, window.location.pathname);
const router = createAppRouter(queryClient);

const container = document.getElementById('root');
if (!container) throw new Error('index.html must contain <div id="root">.');

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);

// The service worker keeps the app and the run a tablet works on available without a network.
// Production builds only: in development it would cache what is being edited.
if (import.meta.env.PROD) {
  // The first time the worker takes control, the session this page already holds is not in its cache.
  navigator.serviceWorker?.addEventListener('controllerchange', cacheSessionForOffline);
  void import('virtual:pwa-register').then(({ registerSW }) =>
    registerSW({
      immediate: true,
      // A new version takes over at once, but the page reloads only once it is out of sight, so
      // nobody loses a half-typed reading or problem report to an update.
      onNeedReload: () => {
        const reloadWhenHidden = () => {
          if (document.visibilityState === 'hidden') window.location.reload();
        };
        if (document.visibilityState === 'hidden') window.location.reload();
        else document.addEventListener('visibilitychange', reloadWhenHidden);
      },
    }),
  );
}
