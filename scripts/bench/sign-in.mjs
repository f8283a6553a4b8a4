// A session cookie for a demo user, through next-auth's credentials callback (as the sign-in form does).

export async function signIn(baseUrl, email, password = 'setline-demo') {
  const csrfResponse = await fetch(new URL('/api/auth/csrf', baseUrl));
  const cookies = csrfResponse.headers.getSetCookie().map((c) => c.split(';')[0]);
  const { csrfToken } = await csrfResponse.json();
  const response = await fetch(new URL('/api/auth/callback/credentials', baseUrl), {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: cookies.join('; ') },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
  const session = response.headers.getSetCookie().map((c) => c.split(';')[0]);
  if (!session.some((c) => c.includes('session-token')))
    throw new Error(`sign-in as ${email} failed (${response.status})`);
  return [...cookies, ...session].join('; ');
}

/** The first install of the signed-in crew's list (its page is the install screen). */
export async function firstInstallPath(baseUrl, cookie) {
  const response = await fetch(new URL('/api/installs?pageSize=1', baseUrl), { headers: { cookie } });
  if (!response.ok) throw new Error(`GET /api/installs: ${response.status}`);
  const { items } = await response.json();
  if (!items?.length) throw new Error('no install to measure: seed the demo first');
  return `/installs/${items[0].id}`;
}
