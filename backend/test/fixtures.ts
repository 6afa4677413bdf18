import type { Express } from 'express';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';

import type { Role, Session } from '@tracewright/shared';

import { hashSecret } from '../src/lib/secret-hashing';
import { UserModel } from '../src/models/user.model';
import { uniqueEmail } from './test-context';

export const TEST_PASSWORD = 'copper-trace-2026';
export const TEST_PIN = '4831';

export async function createUser(
  role: Role,
  options: { status?: 'invited' | 'active' | 'deactivated'; pin?: string; name?: string } = {},
): Promise<UserModel> {
  return UserModel.create({
    email: uniqueEmail(role),
    name: options.name ?? `Test ${role} ${Math.random().toString(36).slice(2, 7)}`,
    role,
    status: options.status ?? 'active',
    passwordHash: await hashSecret(TEST_PASSWORD),
    pinHash: options.pin ? await hashSecret(options.pin) : null,
  });
}

export interface SignedIn {
  agent: TestAgent;
  csrf: string;
  session: Session;
  user: UserModel;
}

/** Signs in through the API like a browser: the agent keeps the cookies, writes need the CSRF header. */
export async function signInAs(app: Express, user: UserModel, password = TEST_PASSWORD): Promise<SignedIn> {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  const session = res.body as Session;
  return { agent, csrf: session.csrfToken, session, user };
}

export async function signedInUser(app: Express, role: Role, options: { pin?: string } = {}): Promise<SignedIn> {
  return signInAs(app, await createUser(role, options));
}
