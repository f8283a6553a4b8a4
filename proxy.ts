import { withAuth } from 'next-auth/middleware';

// Redirects signed-out visitors to /sign-in. It is never the authorization check:
// every page, route handler and server action calls requireUser itself.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  matcher: ['/((?!api|_next|sign-in|forbidden|favicon|.*\\.[a-z0-9]+$).*)'],
};
