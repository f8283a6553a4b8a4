import 'server-only';
import bcrypt from 'bcryptjs';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { User } from '@/models';
import { signInSchema } from '@/lib/validation/auth';
import { safeRedirect } from './callback-url';
import { authSecret } from './secret';

// Compared against when the e-mail is unknown, so both failures take the same time.
const DUMMY_HASH = '$2b$12$KmJz3YskaqY8OKmQx6oTFeAcu9JZGSd7OaZFf2WtWTl6JKW3RK0sG';

export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(credentials) {
        const parsed = signInSchema.safeParse(credentials);
        if (!parsed.success) return null;
        const user = await User.unscoped().findOne({ where: { email: parsed.data.email } });
        const ok = await bcrypt.compare(parsed.data.password, user?.passwordHash ?? DUMMY_HASH);
        if (!user || !ok || !user.active) return null;
        return {
          id: user.id,
          name: user.name,
          email: user.email,
          companyId: user.companyId,
          role: user.role,
          tokenVersion: user.tokenVersion,
        };
      },
    }),
  ],
  callbacks: {
    // Only addresses of this site: a crafted callbackUrl never sends a user elsewhere.
    async redirect({ url, baseUrl }) {
      return safeRedirect(url, baseUrl);
    },
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.companyId = user.companyId;
        token.role = user.role;
        token.tokenVersion = user.tokenVersion;
      }
      return token;
    },
    async session({ session, token }) {
      session.user = { ...session.user, id: token.sub ?? '', companyId: token.companyId, role: token.role };
      return session;
    },
  },
};
