// Real HTTP against the app server that global-setup launched.
import request from 'supertest';
import { inject } from 'vitest';
import type { Role } from '../../lib/roles';
import { createUser, TEST_PASSWORD } from './db';
import './test-env';

export const baseUrl = (): string => inject('baseUrl');

export type Agent = ReturnType<typeof request.agent>;

export function anonymous(): Agent {
  return request.agent(baseUrl());
}

// A fresh user of the role, signed in through the public API (of another app instance when given).
export async function signedIn(role: Role, url = baseUrl()): Promise<{ agent: Agent; userId: number; email: string }> {
  const user = await createUser(role);
  const agent = request.agent(url);
  const res = await agent.post('/api/v1/session').send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, userId: user.id, email: user.email };
}
