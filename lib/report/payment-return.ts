// The way back from the payment provider. The provider is given /r/back/<link id> only; "Pay now" leaves
// the report token in this cookie (HttpOnly, Lax: sent on the provider's top-level redirect back, scoped
// to /r/back, one hour). /r/back opens the report when the cookie's link is the one named, and otherwise
// shows a plain thank-you page that reveals nothing of the report.

export const RETURN_COOKIE = 'setline-report-return';
export const RETURN_COOKIE_SECONDS = 3600;

export function returnCookieOptions(request: Request) {
  return {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: new URL(request.url).protocol === 'https:' || request.headers.get('x-forwarded-proto') === 'https',
    path: '/r/back',
    maxAge: RETURN_COOKIE_SECONDS,
  };
}
