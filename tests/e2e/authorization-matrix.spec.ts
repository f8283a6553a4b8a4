import { randomUUID } from 'node:crypto';
import { expect, request, test, type APIRequestContext, type APIResponse } from '@playwright/test';
import { Pool } from 'pg';
import { BASE_URL } from '../../playwright.config';
import { listPageFiles, listRouteFiles } from '../fixtures/route-tree';
import { DEMO_PASSWORD } from './helpers';
import {
  API,
  CALLERS,
  PAGES,
  PROBE,
  type Caller,
  type CloneTable,
  type Expectation,
  type Row,
} from './authorization-table';

// Every route × method × caller and every page × caller against the production server and the seeded demo,
// checked against the table in authorization-table.ts. No browser pages: one request context per caller.

const EMAILS: Record<Exclude<Caller, 'none'>, string> = {
  admin: 'admin@demo.test',
  office: 'office@demo.test',
  foreman: 'foreman@demo.test',
  tech: 'tech@demo.test',
  tech2: 'tech2@demo.test',
  foreign: 'office@second.test',
};

/** Demo rows of the North crew's closed job (its install approved, its invoice paid) and the company's settings. */
type Ids = Record<string, string>;

async function demoIds(db: Pool): Promise<Ids> {
  const one = async (sql: string, params: unknown[] = []) => {
    const { rows } = await db.query(sql, params);
    if (!rows[0]) throw new Error(`demo row missing: ${sql}`);
    return rows[0].id as string;
  };
  const company = await one("SELECT company_id AS id FROM users WHERE email = 'admin@demo.test'");
  const crew = await one("SELECT id FROM crews WHERE company_id = $1 AND name = 'North crew'", [company]);
  const job = await one(
    'SELECT j.id FROM jobs j JOIN invoices v ON v.job_id = j.id JOIN installs i ON i.job_id = j.id WHERE j.crew_id = $1 ORDER BY j.created_at LIMIT 1',
    [crew],
  );
  const install = await one('SELECT id FROM installs WHERE job_id = $1 LIMIT 1', [job]);
  const repair = await one('SELECT repair_id AS id FROM installs WHERE id = $1', [install]);
  const segment = await one('SELECT segment_id AS id FROM repairs WHERE id = $1', [repair]);
  const site = await one('SELECT site_id AS id FROM jobs WHERE id = $1', [job]);
  const tech = await one("SELECT id FROM users WHERE email = 'tech@demo.test'");
  // The demo has no uploaded files: one ready image of the North install, uploaded by its technician.
  const attachment = randomUUID();
  await db.query(
    `INSERT INTO attachments (id, company_id, job_id, repair_id, install_id, kind, storage_key, content_type, byte_size, original_name, uploaded_by_id, status, created_at, updated_at)
     VALUES ($1, $2, $3, $4, $5, 'after', $6, 'image/png', 1024, 'matrix.png', $7, 'ready', now(), now())`,
    [attachment, company, job, repair, install, `matrix/${attachment}.png`, tech],
  );
  return {
    company,
    crew,
    job,
    install,
    repair,
    segment,
    site,
    user: tech,
    attachment,
    customer: await one('SELECT customer_id AS id FROM jobs WHERE id = $1', [job]),
    invoice: await one('SELECT id FROM invoices WHERE job_id = $1 LIMIT 1', [job]),
    accessPoint: await one('SELECT from_access_point_id AS id FROM segments WHERE id = $1', [segment]),
    packer: await one('SELECT packer_id AS id FROM installs WHERE id = $1', [install]),
    resinKit: await one('SELECT resin_kit_id AS id FROM installs WHERE id = $1', [install]),
    resinSystem: await one('SELECT resin_system_id AS id FROM installs WHERE id = $1', [install]),
    checklist: await one('SELECT checklist_template_id AS id FROM installs WHERE id = $1', [install]),
  };
}

/** The demo row each `[id]` names, by the resource before it in the URL. */
const RESOURCE: Record<string, string> = {
  'access-points': 'accessPoint',
  attachments: 'attachment',
  'checklist-templates': 'checklist',
  checklists: 'checklist',
  crews: 'crew',
  customers: 'customer',
  installs: 'install',
  invoices: 'invoice',
  jobs: 'job',
  packers: 'packer',
  repairs: 'repair',
  'resin-kits': 'resinKit',
  'resin-systems': 'resinSystem',
  reviews: 'install',
  segments: 'segment',
  sites: 'site',
  users: 'user',
};

/** The resource of a pattern's first `[id]`: `/api/jobs/[id]/report-links` → job. */
function resourceOf(pattern: string): string {
  const parts = pattern.split('/');
  const at = parts.findIndex((part) => /^\[.+\]$/.test(part));
  return RESOURCE[parts[at - 1]] ?? '';
}

function fill(pattern: string, ids: Ids, idOverride?: string): string {
  const parts = pattern.split('/');
  return parts
    .map((part, i) => {
      if (part === '[token]') return 'not-a-genuine-report-link';
      if (!/^\[.+\]$/.test(part)) return part;
      const id = ids[RESOURCE[parts[i - 1]] ?? ''];
      if (!id)
        throw new Error(`no demo id for ${part} in ${pattern}: add it to RESOURCE in authorization-matrix.spec.ts`);
      return idOverride ?? id;
    })
    .join('/');
}

const urlOf = (pattern: string, row: Row, ids: Ids, idOverride?: string) =>
  row.url ? row.url.replace(/\{(\w+)\}/g, (_, key: string) => ids[key]) : fill(pattern, ids, idOverride);

/** A copy of a demo row for a DELETE that would succeed (unique columns made unique), so the demo keeps its rows. */
const clones: { table: CloneTable; id: string }[] = [];

async function cloneRow(db: Pool, table: CloneTable, id: string): Promise<string> {
  const copy = randomUUID();
  const tag = copy.slice(0, 8);
  const unique: Partial<Record<CloneTable, Record<string, unknown>>> = {
    access_points: { label: `MX-${tag}` },
    attachments: { storage_key: `matrix/${copy}`, thumbnail_key: null },
    crews: { name: `Matrix ${tag}` },
    jobs: { number: `MX-${tag}` },
    resin_kits: { lot: `MX-${tag}` },
  };
  const { rowCount } = await db.query(
    `INSERT INTO ${table} SELECT (jsonb_populate_record(NULL::${table}, to_jsonb(x) || $2::jsonb)).* FROM ${table} x WHERE x.id = $1`,
    [id, JSON.stringify({ id: copy, ...unique[table] })],
  );
  if (rowCount !== 1) throw new Error(`could not copy ${table} ${id}`);
  clones.push({ table, id: copy });
  return copy;
}

async function signedInContext(email: string): Promise<APIRequestContext> {
  const context = await request.newContext({ baseURL: BASE_URL });
  const { csrfToken } = await (await context.get('/api/auth/csrf')).json();
  const answer = await context.post('/api/auth/callback/credentials', {
    form: { csrfToken, email, password: DEMO_PASSWORD, callbackUrl: BASE_URL, json: 'true' },
    maxRedirects: 0,
  });
  const cookies = (await context.storageState()).cookies.map((c) => c.name);
  if (!cookies.some((name) => name.endsWith('session-token')))
    throw new Error(`sign-in of ${email} failed: ${answer.status()}`);
  return context;
}

/** What the visitor gets: a status, or `→/path` for a redirect (HTTP, or Next's in-page one when the page streamed). */
async function outcome(response: APIResponse, page: boolean): Promise<number | string> {
  const status = response.status();
  const location = response.headers()['location'];
  if (status >= 300 && status < 400 && location) return `→${new URL(location, BASE_URL).pathname}`;
  if (!page) return status;
  const html = await response.text();
  const streamed = /<meta id="__next-page-redirect" http-equiv="refresh" content="\d+;url=([^"]+)"/.exec(html);
  if (streamed) return `→${new URL(streamed[1].replace(/&amp;/g, '&'), BASE_URL).pathname}`;
  if (status === 200 && html.includes('NEXT_HTTP_ERROR_FALLBACK;404')) return 404;
  return status;
}

const matches = (expected: Expectation, actual: number | string) =>
  Array.isArray(expected) ? expected.includes(actual as number) : expected === actual;

test('authorization matrix: every route, method and page answers each caller as the table says', async () => {
  test.setTimeout(600_000);
  const routes = listRouteFiles();
  const pages = listPageFiles();

  // Every file, method and page has its row; a row naming nothing that exists is stale (unless pending).
  const missing: string[] = [];
  const apiCases: [string, Row][] = [];
  for (const { route, file, methods } of routes) {
    if (methods.length === 0) missing.push(`${file}: exports no HTTP method the matrix knows`);
    for (const method of methods) {
      const key = `${method} ${route}`;
      if (!API[key]) missing.push(`${key} (${file}) has no row in tests/e2e/authorization-table.ts`);
      else apiCases.push([key, API[key]]);
    }
  }
  const pageCases: [string, Row][] = [];
  for (const { route, file } of pages) {
    if (!PAGES[route]) missing.push(`page ${route} (${file}) has no row in tests/e2e/authorization-table.ts`);
    else pageCases.push([route, PAGES[route]]);
  }
  const known = new Set([...apiCases.map(([key]) => key), ...pageCases.map(([key]) => key)]);
  const pending: string[] = [];
  for (const [key, row] of [...Object.entries(API), ...Object.entries(PAGES)]) {
    if (known.has(key)) continue;
    if (row.pending) pending.push(`${key} (${row.pending})`);
    else missing.push(`${key} is in the table but no such route, method or page exists`);
  }
  expect(missing, missing.join('\n')).toEqual([]);

  const methodCount = apiCases.length + pageCases.length;
  console.log(
    `authorization matrix: ${routes.length + pages.length} routes (${routes.length} route files, ${pages.length} pages) × ` +
      `${methodCount} methods × ${CALLERS.length} callers = ${methodCount * CALLERS.length} cases`,
  );
  for (const p of pending) console.log(`authorization matrix: pending, not yet in the tree: ${p}`);

  const db = new Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
  const contexts = {} as Record<Caller, APIRequestContext>;
  try {
    const ids = await demoIds(db);
    for (const caller of CALLERS)
      contexts[caller] =
        caller === 'none' ? await request.newContext({ baseURL: BASE_URL }) : await signedInContext(EMAILS[caller]);

    const failures: string[] = [];
    const run = async (key: string, row: Row, caller: Caller, page: boolean) => {
      const [method, pattern] = page ? ['GET', key] : key.split(' ');
      const idOverride = row.clone ? await cloneRow(db, row.clone, ids[resourceOf(pattern)]) : undefined;
      const url = urlOf(pattern, row, ids, idOverride);
      const mutating = !['GET', 'HEAD'].includes(method);
      const send = () =>
        contexts[caller].fetch(url, {
          method,
          maxRedirects: 0,
          ...(mutating && !url.startsWith('/api/auth/') ? { data: row.body ?? PROBE } : {}),
        });
      // A kept-alive socket the server closed just as it was reused is a transport hiccup, not an answer: once more.
      const response = await send().catch((error: Error) => {
        if (!/ECONNRESET|socket hang up/.test(error.message)) throw error;
        return send();
      });
      const actual = await outcome(response, page);
      const expected = row.expect[caller];
      if (!matches(expected, actual))
        failures.push(
          `${page ? 'page ' : ''}${key} as ${caller} (${url}): expected ${JSON.stringify(expected)}, got ${JSON.stringify(actual)}`,
        );
      if (typeof actual === 'number' && actual >= 500)
        failures.push(`${key} as ${caller}: ${actual} ${(await response.text()).slice(0, 300)}`);
    };

    // A few requests at a time: the server is real and the machine small.
    const jobs = [
      ...apiCases.flatMap(([key, row]) => CALLERS.map((caller) => () => run(key, row, caller, false))),
      ...pageCases.flatMap(([key, row]) => CALLERS.map((caller) => () => run(key, row, caller, true))),
    ];
    for (let i = 0; i < jobs.length; i += 4) {
      // Settled, not raced: a case that throws is a failure, and no request is left in flight.
      for (const result of await Promise.allSettled(jobs.slice(i, i + 4).map((job) => job()))) {
        if (result.status === 'rejected') failures.push(String(result.reason).slice(0, 400));
      }
    }
    expect(
      failures,
      `${failures.length} of ${jobs.length} cases differ from the table:\n${failures.join('\n')}`,
    ).toEqual([]);
  } finally {
    // The demo is shared with the other specs: the copies (deleted or only archived) and the test image go.
    for (const { table, id } of clones.reverse())
      await db.query(`DELETE FROM ${table} WHERE id = $1`, [id]).catch((e) => console.error(e));
    await db.query("DELETE FROM attachments WHERE storage_key LIKE 'matrix/%'");
    await db.end();
    await Promise.allSettled(Object.values(contexts).map((c) => c.dispose()));
  }
});
