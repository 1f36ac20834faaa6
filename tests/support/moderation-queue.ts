import type TestAgent from 'supertest/lib/agent';
import type { ModerationQueueItem } from '../../shared/types/listings';

/** Every page of the moderation queue, read as the moderator signed in to `agent` (it holds every test's listings). */
export async function wholeQueue(agent: TestAgent): Promise<ModerationQueueItem[]> {
  const items: ModerationQueueItem[] = [];
  for (let page = 1; ; page += 1) {
    const res = await agent.get('/api/moderation/queue').query({ page, pageSize: 50 });
    if (res.status !== 200) throw new Error(`queue answered ${res.status}`);
    items.push(...(res.body.items as ModerationQueueItem[]));
    if (items.length >= res.body.total || res.body.items.length === 0) return items;
  }
}
