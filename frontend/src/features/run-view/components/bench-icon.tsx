import { LineGlyph } from '../../../components/icons/line-glyph';
import { BENCH_ICON_PATHS, type BenchIconName } from './bench-icon-paths';

type BenchIconProps = { name: BenchIconName; className?: string; title?: string };

/** Decorative unless titled: the word beside it carries the meaning. */
export function BenchIcon({ name, className = 'size-6', title }: BenchIconProps) {
  return <LineGlyph paths={BENCH_ICON_PATHS[name]} className={className} title={title} />;
}
