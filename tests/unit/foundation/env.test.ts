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

  const url = 'postgres://a:b@127.0.0.1:1/x';
  const SESSION = 's'.repeat(32);
  const LINKS = 'l'.repeat(32);
  const production = {
    DATABASE_URL: url,
    NODE_ENV: 'production',
    NEXTAUTH_SECRET: SESSION,
    REPORT_LINK_SECRET: LINKS,
    NEXTAUTH_URL: 'https://app.example.test',
  };
  const problemsOf = (source: Record<string, string | undefined>) => {
    try {
      parseEnv(source);
      return '';
    } catch (error) {
      return (error as Error).message;
    }
  };

  it('accepts a complete production environment as given', () => {
    expect(parseEnv(production)).toMatchObject({
      NEXTAUTH_SECRET: SESSION,
      REPORT_LINK_SECRET: LINKS,
      SMTP_TLS: 'on',
      TRUSTED_PROXY: 0,
    });
  });

  it('refuses production without either secret, naming each', () => {
    expect(problemsOf({ ...production, NEXTAUTH_SECRET: undefined })).toMatch(
      /NEXTAUTH_SECRET: required outside development and test/,
    );
    expect(problemsOf({ ...production, REPORT_LINK_SECRET: undefined })).toMatch(
      /REPORT_LINK_SECRET: required outside development and test/,
    );
    const both = problemsOf({ ...production, NEXTAUTH_SECRET: '', REPORT_LINK_SECRET: '' });
    expect(both).toMatch(/^Setline cannot start/);
    expect(both).toMatch(/NEXTAUTH_SECRET[\s\S]*REPORT_LINK_SECRET/);
  });

  it('refuses secrets under 32 characters, and one secret used for both', () => {
    expect(problemsOf({ ...production, NEXTAUTH_SECRET: 'x'.repeat(31) })).toMatch(
      /NEXTAUTH_SECRET must be at least 32 characters/,
    );
    expect(problemsOf({ ...production, REPORT_LINK_SECRET: 'x'.repeat(31) })).toMatch(
      /REPORT_LINK_SECRET must be at least 32 characters/,
    );
    expect(problemsOf({ ...production, REPORT_LINK_SECRET: SESSION })).toMatch(
      /REPORT_LINK_SECRET: must differ from NEXTAUTH_SECRET/,
    );
  });

  it('refuses a plain-http public address in production, except on loopback', () => {
    expect(problemsOf({ ...production, NEXTAUTH_URL: 'http://app.example.test' })).toMatch(
      /NEXTAUTH_URL: must be an https:\/\/ address/,
    );
    expect(problemsOf({ ...production, APP_URL: 'http://reports.example.test' })).toMatch(
      /APP_URL: must be an https:\/\/ address/,
    );
    for (const loopback of [
      'http://127.0.0.1:3000',
      'http://localhost:3000',
      'http://[::1]:3000',
      'http://demo.localhost',
    ]) {
      expect(problemsOf({ ...production, NEXTAUTH_URL: loopback })).toBe('');
    }
  });

  it('generates a random secret per parse in development and test, never a fixed one', () => {
    const a = parseEnv({ DATABASE_URL: url, NODE_ENV: 'test' });
    const b = parseEnv({ DATABASE_URL: url, NODE_ENV: 'development' });
    expect(a.NEXTAUTH_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(a.REPORT_LINK_SECRET.length).toBeGreaterThanOrEqual(32);
    expect(new Set([a.NEXTAUTH_SECRET, a.REPORT_LINK_SECRET, b.NEXTAUTH_SECRET, b.REPORT_LINK_SECRET]).size).toBe(4);
  });

  it('keeps SMTP on TLS unless SMTP_TLS=off is set explicitly', () => {
    expect(parseEnv({ DATABASE_URL: url }).SMTP_TLS).toBe('on');
    expect(parseEnv({ DATABASE_URL: url, SMTP_TLS: 'off' }).SMTP_TLS).toBe('off');
    expect(problemsOf({ DATABASE_URL: url, SMTP_TLS: 'no' })).toMatch(/SMTP_TLS is on or off/);
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
