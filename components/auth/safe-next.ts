/** Where to go after signing in: only a path inside this app (never another site, never "//host"). */
export function safeNext(next: string | string[] | undefined): string {
  const n = Array.isArray(next) ? next[0] : next;
  if (!n || !n.startsWith('/') || n.startsWith('//') || n.startsWith('/\\')) return '/';
  if (/^\/(sign-in|sign-up|forgot-password|reset-password)/.test(n)) return '/';
  return n;
}
