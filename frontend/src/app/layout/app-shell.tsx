import { Suspense, useEffect, useRef } from 'react';
import { Outlet, useLocation } from 'react-router';

import { LoadingState } from '../../components/ui/loading-state';
import { useSession } from '../../lib/session';
import { AppHeader } from './app-header';
import { SideNav } from './side-nav';

export function AppShell() {
  const { user } = useSession();
  const { pathname } = useLocation();
  const mainRef = useRef<HTMLElement>(null);
  const shownPath = useRef(pathname);

  // After an in-app navigation, start keyboard and screen-reader users at the new content.
  // Compared by path (not "first run") so StrictMode's repeated effect does not steal focus on load.
  useEffect(() => {
    if (shownPath.current === pathname) return;
    shownPath.current = pathname;
    mainRef.current?.focus();
  }, [pathname]);

  return (
    <div className="min-h-screen md:grid md:grid-cols-[14rem_1fr] md:grid-rows-[auto_1fr]">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded-md focus:bg-white focus:p-3 focus:font-bold">
        Skip to content
      </a>
      <AppHeader user={user} />
      <SideNav role={user.role} />
      <main id="main" ref={mainRef} tabIndex={-1} className="min-w-0 px-4 py-6 outline-none md:px-6">
        <div className="mx-auto max-w-6xl">
          <Suspense fallback={<LoadingState />}>
            <Outlet />
          </Suspense>
        </div>
      </main>
    </div>
  );
}
