/**
 * Zod checks input without generating code in the browser: the CSP (script-src 'self') forbids eval, and zod's
 * probe for it is otherwise reported as a violation on every page that validates a form. Zod 4 keeps its settings
 * on `globalThis.__zod_globalConfig` (what `z.config()` writes to); setting it here, before any schema loads, keeps
 * zod itself out of the first script every page needs. tests/client/zod-jitless.test.ts checks zod still reads it.
 */
const scope = globalThis as { __zod_globalConfig?: { jitless?: boolean } };
scope.__zod_globalConfig = { ...scope.__zod_globalConfig, jitless: true };

export {};
