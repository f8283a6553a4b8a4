import { afterAll, vi } from 'vitest';
import { currentJar } from './helpers/session';

// Route handlers read the session cookie through next/headers; outside a Next request the
// tests hand it a jar they control. Everything after the cookie (JWT decoding, the user row) is real.
vi.mock('next/headers', () => ({
  cookies: async () => ({
    get: (name: string) => (currentJar().has(name) ? { name, value: currentJar().get(name) } : undefined),
    getAll: () => [...currentJar()].map(([name, value]) => ({ name, value })),
  }),
  headers: async () => new Headers(),
}));

afterAll(async () => {
  const { sequelize } = await import('@/lib/data/db');
  await sequelize.close();
});
