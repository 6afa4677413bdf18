type PathParts = { pathname: string; search?: string; hash?: string };

/**
 * Only paths inside this app may follow a sign-in; anything else (`//evil.example`, `https:…`)
 * falls back to home so a crafted link cannot bounce a person to another site.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  return next;
}

export function signInPath(from?: PathParts): string {
  if (!from) return '/sign-in';
  const next = `${from.pathname}${from.search ?? ''}${from.hash ?? ''}`;
  return next === '/' || next.startsWith('/sign-in') ? '/sign-in' : `/sign-in?next=${encodeURIComponent(next)}`;
}
