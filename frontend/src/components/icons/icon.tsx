import { ICON_PATHS, type IconName } from './icon-paths';

type IconProps = { name: IconName; className?: string; title?: string };

/** Decorative by default (the word beside it carries the meaning); pass `title` to make it speak. */
export function Icon({ name, className = 'size-5', title }: IconProps) {
  return (
    <svg
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={`shrink-0 ${className}`}
      aria-hidden={title ? undefined : true}
      role={title ? 'img' : undefined}
      aria-label={title}
      focusable="false"
    >
      {ICON_PATHS[name].map((d) => (
        <path key={d} d={d} />
      ))}
    </svg>
  );
}
