/** Fields share one look: white well, graphite-500 edge (≥ 3:1 on paper), oxide edge when wrong. */
export function fieldClasses(hasError: boolean, extra = ''): string {
  const edge = hasError ? 'border-oxide-700' : 'border-graphite-500';
  return `block w-full min-h-11 rounded-md border-2 ${edge} bg-white px-3 py-2 text-base text-graphite-900 placeholder:text-graphite-500 ${extra}`.trim();
}
