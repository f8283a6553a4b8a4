import { describe, expect, it } from 'vitest';
import { EnvError, parseEnv } from '@/lib/env';

describe('parseEnv', () => {
  it('accepts a postgres URL and fills defaults', () => {
    expect(parseEnv({ DATABASE_URL: 'postgres://a:b@127.0.0.1:54329/setline' })).toMatchObject({
      DATABASE_URL: 'postgres://a:b@127.0.0.1:54329/setline',
      NODE_ENV: 'development',
    });
  });

  it('says clearly what to do when DATABASE_URL is missing or empty', () => {
    for (const source of [{}, { DATABASE_URL: '' }]) {
      expect(() => parseEnv(source)).toThrow(EnvError);
      expect(() => parseEnv(source)).toThrow(/DATABASE_URL is missing: run `npm run db:start`/);
    }
  });

  it('refuses a URL that is not PostgreSQL', () => {
    expect(() => parseEnv({ DATABASE_URL: 'mysql://x@y/z' })).toThrow(/postgres:\/\//);
  });

  it('needs a session secret in production only', () => {
    const url = 'postgres://a:b@127.0.0.1:1/x';
    expect(() => parseEnv({ DATABASE_URL: url, NODE_ENV: 'production' })).toThrow(/NEXTAUTH_SECRET/);
    expect(parseEnv({ DATABASE_URL: url, NODE_ENV: 'production', NEXTAUTH_SECRET: 'a-long-enough-secret' }).NEXTAUTH_SECRET).toBe('a-long-enough-secret');
    expect(() => parseEnv({ DATABASE_URL: url, NEXTAUTH_SECRET: 'short' })).toThrow(/at least 16/);
  });

  it('lists every problem at once', () => {
    const message = (() => {
      try {
        parseEnv({ NEXTAUTH_URL: 'not a url', NODE_ENV: 'staging' });
      } catch (error) {
        return (error as Error).message;
      }
    })();
    expect(message).toMatch(/DATABASE_URL/);
    expect(message).toMatch(/NEXTAUTH_URL/);
    expect(message).toMatch(/NODE_ENV/);
  });
});
