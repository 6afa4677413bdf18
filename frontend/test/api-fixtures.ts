import { http, HttpResponse } from 'msw';

import type { ErrorCode, LabSettings, Role, Session, User } from '@tracewright/shared';

export function sessionFor(role: Role, user: Partial<Session['user']> = {}): Session {
  return { user: { id: 1, email: 'robin.vale@lab.example', name: 'Robin Vale', role, hasPin: false, ...user }, csrfToken: 'csrf-from-session' };
}

export function aUser(overrides: Partial<User> = {}): User {
  return {
    id: 2,
    email: 'mika.sato@lab.example',
    name: 'Mika Sato',
    role: 'operator',
    status: 'active',
    hasPin: false,
    lastSignInAt: null,
    createdAt: '2026-11-02T09:00:00Z',
    ...overrides,
  };
}

export const LAB_SETTINGS: LabSettings = { labName: 'Stretch Lab North', timeZone: 'Europe/Berlin', paperSize: 'A4' };

/** The body our backend's error handler sends. */
export function apiError(status: number, code: ErrorCode, message: string, details?: unknown) {
  return HttpResponse.json({ error: { code, message, details } }, { status });
}

/** Signed in as `role`, with lab settings for the header: what every shell page needs. */
export function signedInAs(role: Role, user: Partial<Session['user']> = {}) {
  return [
    http.get('/api/auth/session', () => HttpResponse.json(sessionFor(role, user))),
    http.get('/api/settings', () => HttpResponse.json(LAB_SETTINGS)),
  ];
}
