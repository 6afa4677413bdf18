import { ICON_PATHS, type IconName } from './icon-paths';
import { LineGlyph } from './line-glyph';

type IconProps = { name: IconName; className?: string; title?: string };

/** Decorative by default (the word beside it carries the meaning); pass `title` to make it speak. */
export function Icon({ name, className = 'size-5', title }: IconProps) {
  return <LineGlyph paths={ICON_PATHS[name]} className={className} title={title} />;
}
