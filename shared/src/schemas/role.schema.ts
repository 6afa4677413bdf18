import { z } from 'zod';

export const ROLES = ['admin', 'engineer', 'operator', 'quality'] as const;
export const RoleSchema = z.enum(ROLES, { error: 'Role must be one of admin, engineer, operator, quality.' });
export type Role = z.infer<typeof RoleSchema>;

/** What each role is for, in the words people use on the floor. */
export const ROLE_LABELS: Record<Role, { name: string; summary: string }> = {
  admin: { name: 'Admin', summary: 'Manages people, roles and lab settings.' },
  engineer: { name: 'Process engineer', summary: 'Writes recipes, materials and equipment records.' },
  operator: { name: 'Operator', summary: 'Runs released recipes at the bench.' },
  quality: { name: 'Quality', summary: 'Releases recipes, reviews deviations and signs off runs.' },
};
