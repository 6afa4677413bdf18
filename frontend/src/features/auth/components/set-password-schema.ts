import { z } from 'zod';

import { NewPasswordSchema } from '@tracewright/shared';

/** The shared password rule plus a second entry, refused before sending if the two differ. */
export const SetPasswordFormSchema = z
  .object({
    password: NewPasswordSchema,
    confirmPassword: z.string().min(1, 'Type the password a second time.'),
  })
  .refine((v) => v.password === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two passwords differ. Type the same password in both fields.',
  });
