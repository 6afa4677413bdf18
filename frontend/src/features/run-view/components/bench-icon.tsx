import { BENCH_ICON_PATHS, type BenchIconName } from './bench-icon-paths';

type BenchIconProps = { name: BenchIconName; className?: string; title?: string };

/** Decorative unless titled: the word beside it carries the meaning. */
export function BenchIcon({ name, className = 'size-6', title }: BenchIconProps) {
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
      {BENCH_ICON_PATHS[name].map((d) => (
        <path key={d} d={d} />
      ))}
    </svg>
  );
}
