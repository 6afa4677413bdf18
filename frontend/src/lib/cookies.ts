/** Reads one cookie visible to scripts; httpOnly cookies (the session) are never visible here. */
export function readCookie(name: string): string | null {
  for (const part of document.cookie.split(';')) {
    const [rawKey, ...rest] = part.trim().split('=');
    if (rawKey === name) return decodeURIComponent(rest.join('='));
  }
  return null;
}
