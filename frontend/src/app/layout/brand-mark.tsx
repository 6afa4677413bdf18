/** Our mark: a trace with two pads, drawn like the line icons. */
export function BrandMark({ className = 'size-7' }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" className={`text-copper-600 ${className}`} aria-hidden="true" focusable="false">
      <path d="M4.5 17H8l3-10l3 10h5.5" />
      <circle cx="3" cy="17" r="1.5" />
      <circle cx="21" cy="17" r="1.5" />
    </svg>
  );
}
