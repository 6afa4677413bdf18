import { isoDateInZone } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { getLabSettings } from './settings.service';

/** Today as the lab's calendar has it (expiry and calibration are days there, not on the server). */
export async function labToday(ctx: Pick<AppContext, 'clock'>): Promise<string> {
  const { timeZone } = await getLabSettings();
  return isoDateInZone(ctx.clock.now(), timeZone);
}
