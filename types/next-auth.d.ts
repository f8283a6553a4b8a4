import type { Role } from '@/lib/domain/vocabulary';

declare module 'next-auth' {
  interface User {
    companyId: string;
    role: Role;
    tokenVersion: number;
  }
  interface Session {
    user: { id: string; companyId: string; role: Role; name?: string | null; email?: string | null };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    companyId: string;
    role: Role;
    tokenVersion: number;
  }
}
