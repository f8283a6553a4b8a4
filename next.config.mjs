import { withSerwist } from '@serwist/turbopack';
import createNextIntlPlugin from 'next-intl/plugin';

// Points next-intl at i18n/request.ts (the locale and catalogue of each request). The catalogues are compiled at
// build time: pages then ship a small formatter instead of the ICU message parser, and format without parsing.
const withNextIntl = createNextIntlPlugin({
  requestConfig: './i18n/request.ts',
  experimental: { messages: { path: './messages', format: 'json', locales: 'infer', precompile: true } },
});

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that the bundler cannot follow.
  serverExternalPackages: ['sequelize', 'pg', 'pg-hstore'],
  poweredByHeader: false,
  async headers() {
    // The worker keeps one address across builds: a shared cache holding it for the default
    // year would keep tablets on an old worker. Browsers revalidate it; so must any CDN.
    // proxy.ts gives every other response its security headers; the build's static files skip the
    // proxy, so they get theirs here.
    return [
      { source: '/serwist/:path*', headers: [{ key: 'Cache-Control', value: 'no-cache' }] },
      {
        source: '/_next/:path(static|image)/:rest*',
        headers: [
          { key: 'X-Content-Type-Options', value: 'nosniff' },
          { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
          { key: 'Content-Security-Policy', value: "default-src 'none'; frame-ancestors 'none'" },
        ],
      },
    ];
  },
};

// Adds esbuild to serverExternalPackages: the service worker route (app/serwist) runs it.
export default withSerwist(withNextIntl(nextConfig));
