import { requireFinite } from './input-guards';
import { ProcessInputError } from './process-input-error';

/** Identifiers of the printable windows for Z = 1/Oh. */
export type JettingWindowId = 'reis-derby' | 'jang-kim-moon';

/** A printable window on the Z axis, with what a chart needs to shade it. */
export interface JettingWindow {
  readonly id: JettingWindowId;
  readonly zMin: number;
  readonly zMax: number;
  readonly isMinInclusive: boolean;
  readonly isMaxInclusive: boolean;
  /** Human-readable bounds, e.g. "1 < Z < 10". */
  readonly label: string;
  /** Author/year label used in reasons. */
  readonly source: string;
  /** Which length Z is built on, and how sure we are. */
  readonly lengthConvention: string;
}

export const JETTING_WINDOWS: Readonly<Record<JettingWindowId, JettingWindow>> = {
  'reis-derby': {
    id: 'reis-derby',
    zMin: 1,
    zMax: 10,
    isMinInclusive: false,
    isMaxInclusive: false,
    label: '1 < Z < 10',
    source: 'Reis & Derby 2000',
    lengthConvention: 'Nozzle diameter, as in the printability map restated by Derby 2010.',
  },
  'jang-kim-moon': {
    id: 'jang-kim-moon',
    zMin: 4,
    zMax: 14,
    isMinInclusive: true,
    isMaxInclusive: true,
    label: '4 ≤ Z ≤ 14',
    source: 'Jang, Kim & Moon 2009',
    // Our references did not confirm whether this window was built on nozzle diameter or radius;
    // we compute Z with the diameter. With the radius, Z would be √2 smaller.
    lengthConvention:
      'Unconfirmed in our references (nozzle diameter or radius); Z here uses the diameter, with the radius it would be √2 smaller.',
  },
};

export const DEFAULT_JETTING_WINDOW: JettingWindowId = 'reis-derby';

/** Where a Z value falls relative to a window. */
export type ZWindowPosition = 'below' | 'inside' | 'above';

/**
 * Returns the window definition, rejecting unknown ids (callers outside TypeScript).
 * @example jettingWindow('jang-kim-moon').zMax // → 14
 */
export function jettingWindow(windowId: JettingWindowId = DEFAULT_JETTING_WINDOW): JettingWindow {
  if (!Object.hasOwn(JETTING_WINDOWS, windowId)) {
    const known = Object.keys(JETTING_WINDOWS).join(', ');
    throw new ProcessInputError(
      'window',
      `The printable window must be one of ${known}; got ${String(windowId)}.`,
    );
  }
  return JETTING_WINDOWS[windowId];
}

/**
 * Places Z below, inside or above a window, honouring each bound's inclusivity.
 * @example zWindowPosition(6.78) // → 'inside' (1 < Z < 10); zWindowPosition(10) // → 'above'
 */
export function zWindowPosition(
  z: number,
  windowId: JettingWindowId = DEFAULT_JETTING_WINDOW,
): ZWindowPosition {
  requireFinite('z', z);
  const w = jettingWindow(windowId);
  const isBelow = w.isMinInclusive ? z < w.zMin : z <= w.zMin;
  if (isBelow) return 'below';
  const isAbove = w.isMaxInclusive ? z > w.zMax : z >= w.zMax;
  return isAbove ? 'above' : 'inside';
}
