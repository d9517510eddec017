import request from 'supertest';
import type { Express } from 'express';
import { randomUUID } from 'node:crypto';
import { User } from '../../server/db/models';
import { hashPassword } from '../../server/auth/passwords';
import type { Role } from '../../shared/schemas/auth';

export const TEST_PASSWORD = 'correct-horse-battery-42';

/** A real user row of the given role with a unique e-mail (each test file isolates its data this way). */
export async function createUser(
  role: Role,
  overrides: Partial<{ email: string; name: string; password: string }> = {},
) {
  const email = overrides.email ?? `${role}-${randomUUID().slice(0, 8)}@test.invalid`;
  return User.create({
    email,
    name: overrides.name ?? `Test ${role}`,
    role,
    passwordHash: await hashPassword(overrides.password ?? TEST_PASSWORD),
  });
}

export type Agent = ReturnType<typeof request.agent> & { csrf: string; user?: User };

/** An agent holding a session cookie and the session's CSRF token; signed in when a role is given. */
export async function agentFor(app: Express, role?: Role): Promise<Agent> {
  const agent = request.agent(app) as Agent;
  let user: User | undefined;
  if (role) {
    user = await createUser(role);
    const token = await csrf(agent);
    const login = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({
      email: user.email,
      password: TEST_PASSWORD,
    });
    if (login.status !== 200) throw new Error(`login failed: ${login.status} ${JSON.stringify(login.body)}`);
    agent.csrf = login.body.csrfToken;
  } else {
    agent.csrf = await csrf(agent);
  }
  agent.user = user;
  return agent;
}

async function csrf(agent: ReturnType<typeof request.agent>): Promise<string> {
  const res = await agent.get('/api/auth/csrf');
  return res.body.token as string;
}
