/** One signed-in person on a simulated tablet: the session cookie and the CSRF token writes need. */
export interface TabletSession {
  baseUrl: string;
  userId: number;
  cookie: string;
  csrf: string;
}

/** What one HTTP attempt came back with; `status` 0 is a network error, -1 our own time limit. */
export interface Attempt {
  status: number;
  retryAfter: string | null;
  isReplay: boolean;
  body: unknown;
  startedAt: number;
  endedAt: number;
  error?: string;
}

/** A request that takes longer than this counts as a hang: the API must answer, even if only 503. */
export const HANG_MS = 15_000;

export async function signIn(baseUrl: string, email: string, password: string): Promise<TabletSession> {
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`Signing in ${email} failed: ${res.status} ${await res.text()}`);
  const session = (await res.json()) as { user: { id: number }; csrfToken: string };
  // Only the name=value part of each cookie goes back to the server.
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  return { baseUrl, userId: session.user.id, cookie, csrf: session.csrfToken };
}

/** One POST as the tablet's outbox sends it: session, CSRF header and, when given, the Idempotency-Key. */
export async function postOnce(session: TabletSession, path: string, body: unknown, key?: string): Promise<Attempt> {
  const startedAt = Date.now();
  const headers: Record<string, string> = { 'Content-Type': 'application/json', Cookie: session.cookie, 'X-CSRF-Token': session.csrf };
  if (key) headers['Idempotency-Key'] = key;
  try {
    const res = await fetch(`${session.baseUrl}${path}`, { method: 'POST', headers, body: JSON.stringify(body), signal: AbortSignal.timeout(HANG_MS) });
    const text = await res.text();
    return {
      status: res.status,
      retryAfter: res.headers.get('retry-after'),
      isReplay: res.headers.get('idempotent-replay') === 'true',
      body: text ? (JSON.parse(text) as unknown) : null,
      startedAt,
      endedAt: Date.now(),
    };
  } catch (error) {
    const isTimeout = error instanceof Error && error.name === 'TimeoutError';
    return { status: isTimeout ? -1 : 0, retryAfter: null, isReplay: false, body: null, startedAt, endedAt: Date.now(), error: String(error) };
  }
}

/** A plain GET, for the health probe. */
export async function getStatus(baseUrl: string, path: string): Promise<Attempt> {
  const startedAt = Date.now();
  try {
    const res = await fetch(`${baseUrl}${path}`, { signal: AbortSignal.timeout(HANG_MS) });
    const text = await res.text();
    let body: unknown = text;
    try {
      body = JSON.parse(text);
    } catch {
      /* a non-JSON answer is kept as text */
    }
    return { status: res.status, retryAfter: res.headers.get('retry-after'), isReplay: false, body, startedAt, endedAt: Date.now() };
  } catch (error) {
    const isTimeout = error instanceof Error && error.name === 'TimeoutError';
    return { status: isTimeout ? -1 : 0, retryAfter: null, isReplay: false, body: null, startedAt, endedAt: Date.now(), error: String(error) };
  }
}
