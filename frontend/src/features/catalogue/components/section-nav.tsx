import { NavLink } from 'react-router';

export type SectionLink = { to: string; label: string };

const LINK = 'inline-flex min-h-11 items-center border-b-4 px-4 font-bold hover:bg-graphite-100';

/** The parts of a section (inks, substrates, lots) as links: each part has its own address. */
export function SectionNav({ label, links }: { label: string; links: readonly SectionLink[] }) {
  return (
    <nav aria-label={label} className="mb-6 border-b border-graphite-300">
      <ul className="-mb-px flex flex-wrap gap-1">
        {links.map((link) => (
          <li key={link.to}>
            <NavLink
              to={link.to}
              className={({ isActive }) => `${LINK} ${isActive ? 'border-copper-600 text-graphite-900' : 'border-transparent text-graphite-700'}`}
            >
              {link.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
