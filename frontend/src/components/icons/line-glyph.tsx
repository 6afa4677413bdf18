type LineGlyphProps = { paths: readonly string[]; className: string; title?: string; 'data-step-kind'?: string };

/**
 * Our line drawings: 24 px grid, 2 px round stroke in the text colour. Decorative unless `title`
 * is given (the word beside it carries the meaning). Icons, bench icons and step glyphs all draw here.
 */
export function LineGlyph({ paths, className, title, ...data }: LineGlyphProps) {
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
      {...data}
    >
      {paths.map((d) => (
        <path key={d} d={d} />
      ))}
    </svg>
  );
}
