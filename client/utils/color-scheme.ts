/**
 * Follow the device's light or dark setting by toggling `dark` on <html>, which switches
 * both Element Plus's dark variables and Benchwright's own (see styles/theme.css).
 */
export function followSystemColorScheme(): void {
  const query = window.matchMedia?.('(prefers-color-scheme: dark)');
  const apply = (dark: boolean) => document.documentElement.classList.toggle('dark', dark);
  apply(query?.matches ?? false);
  query?.addEventListener('change', (event) => apply(event.matches));
}
