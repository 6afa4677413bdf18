import type { LabSettings } from '@tracewright/shared';

const PAGE_SIZE: Record<LabSettings['paperSize'], string> = { A4: 'A4', Letter: 'letter' };

/**
 * Print rules for a page that holds `[data-print-root]`: the lab's paper size, black on white
 * with no backgrounds, and the desk shell (header, navigation) left off the paper. Rendered in
 * place, so the rules leave with the page.
 */
export function PrintStyles({ paperSize }: { paperSize: LabSettings['paperSize'] }) {
  const css = `
@page { size: ${PAGE_SIZE[paperSize]}; margin: 12mm; }
@media print {
  html, body { background: #fff !important; color: #000 !important; }
  body:has([data-print-root]) :is(header, nav, aside, [aria-live]):not([data-print-root] *) { display: none !important; }
  body:has([data-print-root]) div:has(> #main) { display: block !important; }
  body:has([data-print-root]) #main { padding: 0 !important; }
  body:has([data-print-root]) #main > div { max-width: none !important; }
  [data-print-root], [data-print-root] * {
    color: #000 !important; background: transparent !important; border-color: #000 !important; box-shadow: none !important;
  }
  [data-print-root] img { image-rendering: pixelated; }
}`;
  return <style>{css}</style>;
}
