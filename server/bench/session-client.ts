/** A signed-in caller for scripts that drive a running server over HTTP (bench, crash and backup tests). */
export interface Session {
  /** `Cookie` header value: the session and the CSRF cookie. */
  cookie: string;
  /** Value for the `x-csrf-token` header. */
  csrf: string;
}

function cookiesOf(res: Response): Record<string, string> {
  const out: Record<string, string> = {};
  for (const c of res.headers.getSetCookie()) {
    const m = /^([^=]+)=([^;]*)/.exec(c);
    if (m) out[m[1]] = m[2];
  }
  return out;
}

/** Gets the CSRF cookie from /api/config, then signs in through the real route. */
export async function signInAs(baseUrl: string, email: string, password: string): Promise<Session> {
  const config = await fetch(`${baseUrl}/api/config`);
  const csrf = cookiesOf(config).rw_csrf;
  if (!csrf) throw new Error('GET /api/config set no CSRF cookie');
  const res = await fetch(`${baseUrl}/api/auth/signin`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: `rw_csrf=${csrf}`, 'x-csrf-token': csrf },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  const session = cookiesOf(res).rw_session;
  return { cookie: `rw_session=${session}; rw_csrf=${csrf}`, csrf };
}

/** Headers for a JSON request as `session`. */
export const sessionHeaders = (session: Session): Record<string, string> => ({ 'content-type': 'application/json', cookie: session.cookie, 'x-csrf-token': session.csrf });

/** A JSON call; resolves with status and parsed body (or text). */
export async function callJson(baseUrl: string, session: Session, method: string, path: string, body?: unknown, signal?: AbortSignal): Promise<{ status: number; body: unknown }> {
  const res = await fetch(`${baseUrl}${path}`, { method, headers: sessionHeaders(session), body: body === undefined ? undefined : JSON.stringify(body), signal });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = JSON.parse(text);
  } catch {
    // not JSON: keep the text
  }
  return { status: res.status, body: parsed };
}
