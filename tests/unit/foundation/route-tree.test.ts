import { describe, expect, it } from 'vitest';
import { exportedMethods, listPageFiles, listRouteFiles, urlPattern } from '@/tests/fixtures/route-tree';

// The authorization matrix and the fuzz suite find routes through this walk: if it missed an export style,
// a route would silently go untested.
describe('route tree', () => {
  it('reads every export style the app uses for HTTP methods', () => {
    expect(exportedMethods('export const GET = handle(async () => x);\nexport const PATCH = routes.PATCH;')).toEqual([
      'GET',
      'PATCH',
    ]);
    expect(exportedMethods('export async function GET() {}\nexport function DELETE() {}')).toEqual(['GET', 'DELETE']);
    expect(exportedMethods('const handler = NextAuth(o);\nexport { handler as GET, handler as POST };')).toEqual([
      'GET',
      'POST',
    ]);
    expect(exportedMethods('export const { dynamic, revalidate, GET } = createRoute({});')).toEqual(['GET']);
    expect(exportedMethods('export type GETResponse = {};\nexport const GETTER = 1;')).toEqual([]);
  });

  it('drops route groups from URLs and finds the files of the real tree', () => {
    expect(urlPattern(`${process.cwd()}/app/(desk)/jobs/[id]/page.tsx`)).toBe('/jobs/[id]');
    const routes = listRouteFiles();
    expect(routes.find((r) => r.route === '/api/auth/[...nextauth]')?.methods).toEqual(['GET', 'POST']);
    expect(routes.find((r) => r.route === '/serwist/[path]')?.methods).toEqual(['GET']);
    expect(routes.find((r) => r.route === '/api/jobs/[id]')).toMatchObject({
      file: 'app/api/jobs/[id]/route.ts',
      methods: ['GET', 'PATCH', 'DELETE'],
    });
    expect(listPageFiles().map((p) => p.route)).toEqual(
      expect.arrayContaining(['/', '/installs/[id]', '/r/[token]', '/sign-in']),
    );
  });
});
