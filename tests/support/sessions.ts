import type TestAgent from 'supertest/lib/agent';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { GOOD_PASSWORD } from './factories';
import { browserLikeAgent, useToken } from './test-app';

/** An agent signed in as `user` (made by buildUser), holding its CSRF token. */
export async function signedInAs(app: AppInstance, user: User): Promise<TestAgent> {
  const agent = await browserLikeAgent(app);
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200);
  useToken(agent, res.body);
  return agent;
}
