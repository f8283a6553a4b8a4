// Signs out through next-auth's own endpoint, as next-auth's client does (CSRF token, then a form
// post asking for a JSON answer), without shipping that client to every page: no page here uses
// its session hooks. The service worker watches this POST to drop the signed-out user's copies.

export async function signOutTo(callbackUrl: string): Promise<void> {
  const csrf = await fetch('/api/auth/csrf', { headers: { accept: 'application/json' } });
  const { csrfToken } = (await csrf.json()) as { csrfToken?: string };
  const response = await fetch('/api/auth/signout', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', accept: 'application/json' },
    body: new URLSearchParams({ csrfToken: csrfToken ?? '', callbackUrl, json: 'true' }),
  });
  const body = (await response.json().catch(() => null)) as { url?: string } | null;
  const url = body?.url ?? callbackUrl;
  window.location.href = url;
  if (url.includes('#')) window.location.reload();
}
