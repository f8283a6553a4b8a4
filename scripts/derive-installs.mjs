// After a seed: fills the derived columns of installs written without them (derived_at IS NULL), so readers
// find them ready (the app would otherwise derive them on first read). The TypeScript is bundled with esbuild
// (pg and sequelize stay external) into .data/ and run once. Needs DATABASE_URL.
import { build } from 'esbuild';
import fs from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..');
const out = path.join(root, '.data', `derive-installs-${process.pid}.mjs`);
fs.mkdirSync(path.dirname(out), { recursive: true });
await build({
  entryPoints: [path.join(root, 'scripts/derive/entry.ts')],
  outfile: out,
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  tsconfig: path.join(root, 'tsconfig.json'),
  external: ['pg', 'pg-hstore', 'sequelize'],
  alias: { 'server-only': path.join(root, 'tests/fixtures/server-only.ts') },
  banner: { js: "import { createRequire } from 'node:module'; const require = createRequire(import.meta.url);" },
  logLevel: 'error',
});
try {
  await import(pathToFileURL(out).href);
} finally {
  fs.rmSync(out, { force: true });
}
