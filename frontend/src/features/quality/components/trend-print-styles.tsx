/**
 * Print rules for the trend page (`[data-print-root]`): black on white, no backgrounds, the desk
 * shell and the page's controls left off, each chart kept whole on one page. Rendered with the
 * page, so the rules leave with it.
 */
export function TrendPrintStyles() {
  const css = `
@media print {
  @page { margin: 12mm; }
  html, body { background: #fff !important; color: #000 !important; }
  body:has([data-print-root]) :is(header, nav, aside, [aria-live]):not([data-print-root] *) { display: none !important; }
  body:has([data-print-root]) div:has(> #main) { display: block !important; }
  body:has([data-print-root]) #main { padding: 0 !important; }
  body:has([data-print-root]) #main > div { max-width: none !important; }
  [data-print-root] * { background: transparent !important; box-shadow: none !important; }
  [data-print-root] :is(p, span, td, th, dd, dt, h1, h2, h3, figcaption, li) { color: #000 !important; }
  [data-print-root] figure, [data-print-root] section { break-inside: avoid; }
}`;
  return <style>{css}</style>;
}
