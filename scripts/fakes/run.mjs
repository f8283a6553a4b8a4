// Starts every local service fake (scripts/fakes/*.fake.mjs) on loopback and writes the environment the
// app needs to reach them to the file named by argv[2] (KEY=VALUE lines). Stops them on SIGTERM/SIGINT.
// Ports: FAKES_PORT_BASE + 1.. (demo and tests use different bases so both can run at once).
import { readdirSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, '../..');
const envFile = process.argv[2] ?? path.join(root, '.data/fakes.env');
const base = Number(process.env.FAKES_PORT_BASE ?? 54390);
const dataDir = process.env.FAKES_DATA_DIR ?? path.join(root, '.data/fakes');

const modules = readdirSync(here)
  .filter((file) => file.endsWith('.fake.mjs'))
  .sort();
// Fixed offsets, so adding a fake never moves another one's port (each gets two: the second for a web view).
const OFFSETS = { mail: 1, s3: 3, payments: 5 };
const running = [];
const env = {};
let spare = 11;
for (const file of modules) {
  const mod = await import(pathToFileURL(path.join(here, file)).href);
  const offset = OFFSETS[file.replace('.fake.mjs', '')] ?? (spare += 2);
  const fake = await mod.start({ dataDir, port: base + offset, webPort: base + offset + 1, root });
  running.push(fake);
  Object.assign(env, fake.env);
  console.error(`[fakes] ${fake.name} ready`);
}
// Written atomically: whoever waits for the file reads it whole.
writeFileSync(
  `${envFile}.tmp`,
  `${Object.entries(env)
    .map(([key, value]) => `${key}=${value}`)
    .join('\n')}\n`,
);
renameSync(`${envFile}.tmp`, envFile);

const stop = async () => {
  await Promise.allSettled(running.map((fake) => fake.stop()));
  process.exit(0);
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
