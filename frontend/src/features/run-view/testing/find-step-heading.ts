import { screen } from '@testing-library/react';

/** Waits that cross the (mocked) network and the outbox: generous, for a loaded test machine. */
export const SLOW = { timeout: 5_000 };

/**
 * Waits for the run page to show a step. The page's code loads lazily, and the first import in
 * a test worker takes a while on a slow machine, hence the longer wait.
 */
export function findStepHeading(title: string): Promise<HTMLElement> {
  return screen.findByRole('heading', { level: 1, name: title }, { timeout: 10_000 });
}
