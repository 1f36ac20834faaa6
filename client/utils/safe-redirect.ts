/**
 * The in-app path to go to after signing in, taken from a `redirect` query value.
 * Anything that could leave the site (`//host`, `/\host`, `https:`) gives `fallback`.
 */
export function safeRedirect(value: unknown, fallback = '/'): string {
  if (typeof value !== 'string') return fallback;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return fallback;
  return value;
}
