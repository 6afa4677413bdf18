import type { ReactNode } from 'react';

/** The grid that holds a card's ResultValue entries. */
export function ResultList({ children }: { children: ReactNode }) {
  return <dl className="grid grid-cols-2 gap-x-6 gap-y-4 sm:grid-cols-3">{children}</dl>;
}
