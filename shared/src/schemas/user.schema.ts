import { z } from 'zod';

import { EmailSchema, textField } from './common.schema';
import { RoleSchema } from './role.schema';

export const USER_STATUSES = ['invited', 'active', 'deactivated'] as const;
export const UserStatusSchema = z.enum(USER_STATUSES);
export type UserStatus = z.infer<typeof UserStatusSchema>;

export const InviteUserInputSchema = z.object({
  email: EmailSchema,
  name: textField('Name', 120),
  role: RoleSchema,
});
export type InviteUserInput = z.infer<typeof InviteUserInputSchema>;

export const UpdateUserInputSchema = z
  .object({
    name: textField('Name', 120).optional(),
    role: RoleSchema.optional(),
    status: z.enum(['active', 'deactivated'], { error: 'Status must be active or deactivated.' }).optional(),
  })
  .refine((v) => v.name !== undefined || v.role !== undefined || v.status !== undefined, {
    message: 'Change at least one of name, role or status.',
  });
export type UpdateUserInput = z.infer<typeof UpdateUserInputSchema>;

export const UserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  status: UserStatusSchema,
  hasPin: z.boolean(),
  lastSignInAt: z.string().nullable(),
  createdAt: z.string(),
});
export type User = z.infer<typeof UserSchema>;
export const UserListSchema = z.object({ users: z.array(UserSchema) });
