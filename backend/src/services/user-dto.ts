import type { SessionUser, User } from '@tracewright/shared';

import type { UserModel } from '../models/user.model';

export const toUserDto = (u: UserModel): User => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  status: u.status,
  hasPin: Boolean(u.pinHash),
  lastSignInAt: u.lastSignInAt ? u.lastSignInAt.toISOString() : null,
  createdAt: u.createdAt.toISOString(),
});

export const toSessionUser = (u: UserModel): SessionUser => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  hasPin: Boolean(u.pinHash),
});

/** What the audit trail keeps of a person: never hashes. */
export const auditableUser = (u: UserModel) => ({ email: u.email, name: u.name, role: u.role, status: u.status });
