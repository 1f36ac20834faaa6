import { describe, expect, it } from 'vitest';

describe('zod in the browser', () => {
  it('validates without generating code, so the CSP (no eval) is never breached', async () => {
    await import('@/utils/zod-jitless');
    const { config, util } = await import('zod/v4/core');
    const { z } = await import('zod');

    expect(config().jitless).toBe(true);
    // Zod's probe for eval (`new Function`) is skipped, so the browser reports no CSP violation.
    expect(util.allowsEval.value).toBe(false);
    expect(z.object({ a: z.string() }).safeParse({ a: 'x' }).success).toBe(true);
  });
});
