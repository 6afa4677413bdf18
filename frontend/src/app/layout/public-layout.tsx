import { Outlet } from 'react-router';

import { BrandMark } from './brand-mark';

/** Pages before sign-in: the mark, then one calm column. */
export function PublicLayout() {
  return (
    <div className="min-h-screen px-4 py-8">
      <header className="mx-auto mb-8 flex max-w-3xl items-center gap-3">
        <BrandMark className="size-9" />
        <p className="text-2xl font-bold">Tracewright</p>
      </header>
      <main id="main" className="mx-auto max-w-3xl">
        <Outlet />
      </main>
    </div>
  );
}
