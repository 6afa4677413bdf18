import { Outlet } from 'react-router';

import { SectionNav, type SectionLink } from './section-nav';

/** A section's sub-navigation above whichever of its pages is open. */
export function SectionLayout({ label, links }: { label: string; links: readonly SectionLink[] }) {
  return (
    <>
      <SectionNav label={label} links={links} />
      <Outlet />
    </>
  );
}
