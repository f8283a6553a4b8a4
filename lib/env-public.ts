// The environment a client component may read: only what Next inlines into the browser bundle at build
// time (NODE_ENV and NEXT_PUBLIC_* variables). Server code reads everything through env() in lib/env.ts.

/** True in `next dev`. */
export const IS_DEVELOPMENT = process.env.NODE_ENV === 'development';
