// Signs in with e-mail and password through next-auth's credentials callback, as next-auth's own client
// does (CSRF token, then a form post asking for a JSON answer), but keeps the server's answer: a 429
// carries the "Too many attempts" message the page shows.

export type SignInOutcome = { ok: true } | { ok: false; status: number; message?: string; retryAfterSeconds?: number };

export async function signInWithPassword(email: string, password: string, callbackUrl: string): Promise<SignInOutcome> {
  const csrf = await fetch('/api/auth/csrf', { headers: { accept: 'application/json' } });
  if (!csrf.ok) return { ok: false, status: csrf.status };
  const { csrfToken } = (await csrf.json()) as { csrfToken?: string };
  const response = await fetch('/api/auth/callback/credentials', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', accept: 'application/json' },
    body: new URLSearchParams({ email, password, csrfToken: csrfToken ?? '', callbackUrl, json: 'true' }),
  });
  const body = (await response.json().catch(() => null)) as { url?: string; error?: { message?: string } } | null;
  if (!response.ok) {
    // The wait in seconds, so the page can say it in the reader's language.
    const retryAfter = Number(response.headers.get('retry-after'));
    return {
      ok: false,
      status: response.status,
      message: body?.error?.message,
      ...(Number.isFinite(retryAfter) && retryAfter > 0 ? { retryAfterSeconds: retryAfter } : {}),
    };
  }
  // next-auth answers 200 with the address to go to; a refused sign-in names an error there.
  const error = body?.url ? new URL(body.url, window.location.origin).searchParams.get('error') : 'unknown';
  return error ? { ok: false, status: 401 } : { ok: true };
}
