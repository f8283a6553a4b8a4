import { withAuth } from 'next-auth/middleware';

// Redirects signed-out visitors to /sign-in. It is never the authorization check:
// every page, route handler and server action calls requireUser itself. /r/<token> (the customer's
// signed report link) needs no account.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  matcher: ['/((?!api|_next|sign-in|forbidden|favicon|r/|.*\\.[a-z0-9]+$).*)'],
};
