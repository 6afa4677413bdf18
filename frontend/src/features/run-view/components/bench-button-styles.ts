export type BenchVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const BASE =
  'inline-flex items-center justify-center gap-2 rounded-lg font-bold leading-tight ' +
  'transition-colors disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60';

const VARIANTS: Record<BenchVariant, string> = {
  primary: 'bg-copper-600 text-white hover:bg-copper-700 active:bg-copper-800',
  secondary: 'border-2 border-graphite-700 bg-white text-graphite-900 hover:bg-graphite-50',
  danger: 'bg-oxide-700 text-white hover:bg-oxide-800',
  quiet: 'border-2 border-transparent text-copper-700 underline underline-offset-4 hover:text-copper-800',
};

// Step actions get 56 px (gloved fingers); header tools keep to the 48 px minimum to save height;
// the one next action of the screen is the largest.
const SIZES = {
  step: 'min-h-14 min-w-14 px-5 text-[1.25rem]',
  compact: 'min-h-12 min-w-12 px-3 text-[1.25rem]',
  hero: 'min-h-20 px-6 text-[1.5rem]',
};

/** Bench buttons: never under 48 × 48 px, 20 px type; pass extra classes for layout only. */
export function benchButton(variant: BenchVariant = 'secondary', extra = '', size: keyof typeof SIZES = 'step'): string {
  return `${BASE} ${SIZES[size]} ${VARIANTS[variant]} ${extra}`.trim();
}
