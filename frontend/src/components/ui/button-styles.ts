export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';
export type ButtonSize = 'md' | 'lg';

const BASE =
  'inline-flex items-center justify-center gap-2 whitespace-nowrap rounded-md font-bold no-underline transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed';

const VARIANTS: Record<ButtonVariant, string> = {
  primary: 'bg-copper-600 text-white hover:bg-copper-700 active:bg-copper-800',
  secondary: 'border-2 border-graphite-500 bg-white text-graphite-900 hover:bg-graphite-50',
  danger: 'bg-oxide-700 text-white hover:bg-oxide-800',
  quiet: 'text-copper-700 underline underline-offset-4 hover:text-copper-800',
};

// 44 px is the desk minimum; 48 px is the bench (gloved hands, tablets).
const SIZES: Record<ButtonSize, string> = {
  md: 'min-h-11 px-4 text-base',
  lg: 'min-h-12 px-6 text-lg',
};

export function buttonClasses(variant: ButtonVariant = 'primary', size: ButtonSize = 'md', extra = ''): string {
  const sizing = variant === 'quiet' ? 'min-h-11 px-1 text-base' : SIZES[size];
  return `${BASE} ${VARIANTS[variant]} ${sizing} ${extra}`.trim();
}
