import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createApp, type AppInstance } from '../../server/app';
import type { Config } from '../../server/config';
import { testConfig } from './test-env';

/** A real app on the test database and local services, with its mail dispatcher running. */
export async function startTestApp(overrides: Partial<Config> = {}): Promise<AppInstance> {
  const instance = await createApp(testConfig(overrides));
  instance.start();
  return instance;
}

/** A cookie-keeping client that already holds a session's CSRF token, as the browser app does. */
export async function browserLikeAgent(instance: AppInstance): Promise<TestAgent> {
  const agent = request.agent(instance.app);
  const { body } = await agent.get('/api/auth/session').expect(200);
  agent.set('X-CSRF-Token', (body as { csrfToken: string }).csrfToken);
  return agent;
}

/** Replace the agent's CSRF token with the one a response handed out (sign-in, sign-out). */
export function useToken(agent: TestAgent, body: unknown): void {
  agent.set('X-CSRF-Token', (body as { csrfToken: string }).csrfToken);
}
