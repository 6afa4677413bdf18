import { z } from 'zod';

import { EmailSchema, IdSchema } from './common.schema';
import { RoleSchema } from './role.schema';

/**
 * Password rule: length over composition, as NIST SP 800-63B recommends (at least 8 characters;
 * we ask 10 for shared lab accounts — our choice, no source). Max 200 keeps argon2 input bounded.
 */
export const NewPasswordSchema = z
  .string({ error: 'Password must be text.' })
  .min(10, 'Use at least 10 characters for the password.')
  .max(200, 'Password can be at most 200 characters.');

export const PinSchema = z
  .string({ error: 'PIN must be text.' })
  .regex(/^\d{4,8}$/, 'PIN must be 4 to 8 digits.');

export const SignInInputSchema = z.object({
  email: EmailSchema,
  password: z.string({ error: 'Password is required.' }).min(1, 'Password is required.').max(200, 'Password can be at most 200 characters.'),
});
export type SignInInput = z.infer<typeof SignInInputSchema>;

export const PinSwitchInputSchema = z.object({
  userId: IdSchema,
  pin: PinSchema,
});
export type PinSwitchInput = z.infer<typeof PinSwitchInputSchema>;

export const SetPinInputSchema = z.object({
  pin: PinSchema,
  password: z.string({ error: 'Password is required.' }).min(1, 'Enter your password to set a PIN.').max(200),
});
export type SetPinInput = z.infer<typeof SetPinInputSchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

export const OneTimeTokenSchema = z
  .string({ error: 'The link is incomplete.' })
  .regex(/^[A-Za-z0-9_-]{32,128}$/, 'This link is not valid. Ask for a new one.');

export const SetPasswordWithTokenSchema = z.object({
  token: OneTimeTokenSchema,
  password: NewPasswordSchema,
});
export type SetPasswordWithToken = z.infer<typeof SetPasswordWithTokenSchema>;

export const SessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  hasPin: z.boolean(),
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

export const SessionSchema = z.object({
  user: SessionUserSchema,
  csrfToken: z.string(),
});
export type Session = z.infer<typeof SessionSchema>;

export const PinUserSchema = z.object({ id: z.number().int(), name: z.string(), role: RoleSchema });
export const PinUsersSchema = z.object({ users: z.array(PinUserSchema) });
export type PinUser = z.infer<typeof PinUserSchema>;

export const InvitationPreviewSchema = z.object({ email: z.string(), name: z.string(), purpose: z.enum(['invitation', 'password-reset']) });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;
