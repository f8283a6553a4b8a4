import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { Client } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const run = promisify(execFile);

// A scratch database of its own, so taking every migration down does not disturb the other tests.
const base = new URL(process.env.DATABASE_URL!);
const scratchName = `${base.pathname.slice(1)}_migrations`;
const scratchUrl = Object.assign(new URL(base.href), { pathname: `/${scratchName}` }).href;

async function admin(sql: string) {
  const client = new Client({ connectionString: Object.assign(new URL(base.href), { pathname: '/postgres' }).href });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

async function tables(): Promise<string[]> {
  const client = new Client({ connectionString: scratchUrl });
  await client.connect();
  try {
    const { rows } = await client.query(
      "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_name NOT IN ('sequelize_meta', 'sequelize_data') ORDER BY 1",
    );
    return rows.map((r) => r.table_name as string);
  } finally {
    await client.end();
  }
}

const cli = (...args: string[]) =>
  run('node_modules/.bin/sequelize-cli', args, { env: { ...process.env, DATABASE_URL: scratchUrl } });

describe('migrations', () => {
  beforeAll(async () => {
    await admin(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`);
    await admin(`CREATE DATABASE "${scratchName}"`);
  });
  afterAll(async () => {
    await admin(`DROP DATABASE IF EXISTS "${scratchName}" WITH (FORCE)`);
  });

  it('go all the way up, all the way down, and up again', async () => {
    await cli('db:migrate');
    const up = await tables();
    expect(up).toEqual(
      expect.arrayContaining([
        'companies',
        'users',
        'crews',
        'crew_members',
        'customers',
        'sites',
        'access_points',
        'segments',
        'jobs',
        'repairs',
        'resin_systems',
        'resin_kits',
        'packers',
        'checklist_templates',
        'installs',
        'install_events',
        'attachments',
        'reviews',
        'audit_entries',
      ]),
    );
    await cli('db:migrate:undo:all');
    expect(await tables()).toEqual([]);
    await cli('db:migrate');
    expect(await tables()).toEqual(up);
  }, 60_000);
});
