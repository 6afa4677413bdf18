import { z } from 'zod';

import { SetPinInputSchema } from '@tracewright/shared';

/** The shared PIN rule plus a second entry: a mistyped PIN would only show up at the tablet. */
export const SetPinFormSchema = SetPinInputSchema.extend({
  pinAgain: z.string().min(1, 'Type the PIN a second time.'),
}).refine((v) => v.pin === v.pinAgain, { path: ['pinAgain'], message: 'The two PINs differ. Type the same digits twice.' });
