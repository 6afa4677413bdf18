import type { AppContext } from '../app-context';

/** What a tablet write says about its own clock (the shared DeviceStampSchema). */
export interface DeviceStamp {
  deviceTime: string | null;
  madeOffline: boolean;
}

export interface StampedTime {
  /** The time the record keeps. */
  at: Date;
  /** True when `at` is the tablet's clock, not ours. */
  isDeviceClock: boolean;
  /** What the tablet's clock said, kept beside our time whatever we chose. */
  deviceTime: Date | null;
}

/**
 * When a tablet write happened. Online, our clock is the truth. A write made offline reaches us
 * later, so the tablet's clock is the better witness of when it happened: we keep it, flagged.
 * A tablet clock ahead of ours cannot be right for something already done: it is capped at now.
 *
 * @example stampedTime(ctx, { deviceTime: '2026-12-02T09:58:00Z', madeOffline: true }) // at 10:05 → { at: 09:58, isDeviceClock: true, … }
 */
export function stampedTime(ctx: Pick<AppContext, 'clock'>, stamp: DeviceStamp): StampedTime {
  const now = ctx.clock.now();
  const deviceTime = stamp.deviceTime === null ? null : new Date(stamp.deviceTime);
  if (!stamp.madeOffline || deviceTime === null) return { at: now, isDeviceClock: false, deviceTime };
  return { at: deviceTime.getTime() > now.getTime() ? now : deviceTime, isDeviceClock: true, deviceTime };
}
