/**
 * HTTP helpers for integration tests against the running test app (APP_URL): sign in through next-auth's
 * credentials flow and keep the session cookie, so that route handlers are exercised with their real guards.
 */
export const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3100";

export type Session = { cookie: string; fetch: (path: string, init?: RequestInit) => Promise<Response> };

function cookiesFrom(res: Response): string[] {
  return res.headers.getSetCookie().map((c) => c.split(";")[0] ?? "");
}

/** Sign in with e-mail and password; throws with the server's reason when refused. */
export async function signIn(email: string, password: string): Promise<Session> {
  const csrfRes = await fetch(`${APP_URL}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = cookiesFrom(csrfRes);
  const res = await fetch(`${APP_URL}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar.join("; ") },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  const all = [...jar, ...cookiesFrom(res)];
  const session = all.find((c) => c.startsWith("next-auth.session-token="));
  if (!session) {
    // With json=true next-auth answers {url: ".../api/auth/error?error=<reason>"}.
    const body = (await res.json().catch(() => ({}))) as { url?: string };
    const reason = body.url ? new URL(body.url, APP_URL).searchParams.get("error") : null;
    throw new Error(`sign-in refused for ${email}: ${reason ?? res.status}`);
  }
  const cookie = all.join("; ");
  return {
    cookie,
    fetch: (path, init) => fetch(`${APP_URL}${path}`, { ...init, redirect: "manual", headers: { ...(init?.headers ?? {}), cookie } }),
  };
}

/** A fetch with a machine token (the DAQ's way in). */
export function withToken(token: string) {
  return (path: string, init?: RequestInit) =>
    fetch(`${APP_URL}${path}`, { ...init, headers: { "content-type": "application/json", ...(init?.headers ?? {}), authorization: `Bearer ${token}` } });
}
