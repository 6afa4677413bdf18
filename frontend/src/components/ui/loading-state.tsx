/** Announced politely so a screen reader knows the page is still arriving. */
export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="p-6 text-graphite-600">
      {label}
    </p>
  );
}
