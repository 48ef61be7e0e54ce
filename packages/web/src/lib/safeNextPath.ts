/**
 * The in-app path to return to after signing in, taken from a `next` query parameter.
 * Only same-origin paths are accepted ("/invite/abc"); anything else ("//evil.example",
 * "https://...", "javascript:...") falls back to `fallback`, so the link cannot send people away.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\'))
    return fallback;
  return next;
}

/** "/signin?next=..." for the page the user is on now. */
export function signInPathFor(currentPath: string): string {
  if (currentPath === '/' || currentPath.startsWith('/signin')) return '/signin';
  return `/signin?next=${encodeURIComponent(currentPath)}`;
}
