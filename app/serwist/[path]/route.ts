import { randomUUID } from 'node:crypto';
import { createSerwistRoute } from '@serwist/turbopack';

// Builds app/sw.ts with esbuild and serves it (and its source map) as /serwist/sw.js. The
// route is static, so the worker is built once, during `next build`.
//
// /sign-in is the one page a signed-out tablet can open, so it is precached; the copy keeps the
// CSP header it was served with, so its script nonce still matches offline. Its HTML names this
// build's hashed chunks, so its revision must change with every build: a fresh id per build does that (the worker is regenerated per build anyway).
const revision = randomUUID();

export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: 'app/sw.ts',
  // esbuild (native) is a dev dependency; esbuild-wasm is not installed.
  useNativeEsbuild: true,
  additionalPrecacheEntries: [{ url: '/sign-in', revision }],
  globPatterns: [
    // Serwist's defaults for a Next app: the build's scripts, styles and images, and public/.
    '.next/static/**/*.{js,css,html,ico,apng,png,avif,jpg,jpeg,gif,svg,webp,json,webmanifest}',
    'public/**/*',
    // The Latin faces of the body font, so a page opened offline keeps its type; the other
    // scripts' faces load (and are kept) only when a page needs them.
    '.next/static/media/inter-latin-[4-7]00-normal.*.woff2',
  ],
  // A classic script, not a module worker: module workers are missing from some browsers
  // still found on tablets. It is registered with type 'classic' to match.
  esbuildOptions: { format: 'iife' },
});
