import path from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Pool } from 'pg';
import { listRouteFiles, MUTATING } from '../fixtures/route-tree';
import { call } from './helpers/call';
import { FUZZ_TARGETS, idsOf } from './helpers/fuzz-targets';
import { withSession } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { arbitraryOf, hostile } from './helpers/zod-arbitrary';

// Every mutating endpoint of the route tree gets RUNS generated bodies: never a 5xx, never a stack trace or SQL
// in the answer, and nothing written when the answer is 4xx. Writes are counted per company by a row trigger on
// every table, in the writing transaction (a rolled-back write counts as none). Each endpoint works in a company
// of its own, so endpoints run several at a time, each with its own session.

const RUNS = Number(process.env.FUZZ_RUNS ?? 1000);
// Endpoints at once: the work is mostly waiting on PostgreSQL, so more streams use the machine better.
vi.setConfig({ maxConcurrency: Number(process.env.FUZZ_CONCURRENCY ?? 8) });

/** Text that must never reach a client: stack frames, SQL, driver and ORM error names, file paths. */
const LEAK =
  /\n\s+at |\bat [\w.<>]+ \(|node_modules|\/work\/|Sequelize\w*Error|\b(SELECT|INSERT INTO|DELETE FROM|UPDATE "?\w+"? SET)\b|violates \w+ constraint|relation "|syntax error|invalid input syntax|out of range for type/;

const endpoints = listRouteFiles()
  .filter((r) => !r.route.startsWith('/api/auth/') && r.route.startsWith('/api/'))
  .flatMap((r) =>
    r.methods.filter((m) => MUTATING.includes(m)).map((method) => ({ key: `${method} ${r.route}`, method, ...r })),
  );

const COUNTER_SQL = `
  DROP TABLE IF EXISTS fuzz_writes;
  CREATE TABLE fuzz_writes (company_id uuid PRIMARY KEY, n bigint NOT NULL);
  CREATE OR REPLACE FUNCTION fuzz_count_write() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE r jsonb := CASE WHEN TG_OP = 'DELETE' THEN to_jsonb(OLD) ELSE to_jsonb(NEW) END;
    BEGIN
      INSERT INTO fuzz_writes VALUES (COALESCE(r->>'company_id', r->>'id')::uuid, 1)
        ON CONFLICT (company_id) DO UPDATE SET n = fuzz_writes.n + 1;
      RETURN NULL;
    END $$;
  DO $$ DECLARE t text; BEGIN
    FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename NOT IN ('fuzz_writes', 'sequelize_meta', 'SequelizeMeta') LOOP
      EXECUTE format('DROP TRIGGER IF EXISTS fuzz_count_write ON %I', t);
      EXECUTE format('CREATE TRIGGER fuzz_count_write AFTER INSERT OR UPDATE OR DELETE ON %I FOR EACH ROW EXECUTE FUNCTION fuzz_count_write()', t);
    END LOOP;
  END $$;`;

const REMOVE_COUNTER_SQL = `
  DO $$ DECLARE t text; BEGIN
    FOR t IN SELECT tablename FROM pg_tables WHERE schemaname = 'public' LOOP
      EXECUTE format('DROP TRIGGER IF EXISTS fuzz_count_write ON %I', t);
    END LOOP;
  END $$;
  DROP FUNCTION IF EXISTS fuzz_count_write();
  DROP TABLE IF EXISTS fuzz_writes;`;

// The counter is read on a plain connection of its own: one round trip, no ORM.
const counter = new Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
const writesOf = async (companyId: string) => {
  const { rows } = await counter.query('SELECT n FROM fuzz_writes WHERE company_id = $1', [companyId]);
  return Number(rows[0]?.n ?? 0);
};

describe('fuzzing every mutating endpoint', () => {
  let foreign: InstallWorld;
  let foreignWrites = 0;
  const tally: string[] = [];
  beforeAll(async () => {
    await counter.query(COUNTER_SQL);
    foreign = await makeInstallWorld('Foreign');
    foreignWrites = await writesOf(foreign.company.id);
  });
  afterAll(async () => {
    await counter.query(REMOVE_COUNTER_SQL);
    await counter.end();
    console.log(tally.sort().join('\n'));
  });

  it('has a fuzz target for every mutating route of the tree', () => {
    const missing = endpoints
      .filter((e) => !FUZZ_TARGETS[e.key])
      .map((e) => `${e.key} (${e.file}) has no entry in tests/integration/helpers/fuzz-targets.ts`);
    const stale = Object.keys(FUZZ_TARGETS).filter((key) => !endpoints.some((e) => e.key === key));
    expect(missing, missing.join('\n')).toEqual([]);
    expect(stale, `entries for routes that do not exist: ${stale.join(', ')}`).toEqual([]);
  });

  describe.concurrent.each(endpoints.filter((e) => FUZZ_TARGETS[e.key]))('$key', (endpoint) => {
    const target = FUZZ_TARGETS[endpoint.key];
    it(`${RUNS} bodies: no 5xx, no leak, nothing written on 4xx`, async ({ expect }) => {
      const handler = (await import(/* @vite-ignore */ path.resolve(endpoint.file)))[endpoint.method];
      const w = await makeInstallWorld('Fuzz');
      const made = (await target.setup?.(w)) ?? {};
      const pools = { own: idsOf(w, made), foreign: idsOf(foreign) };
      const bodies = target.schema ? arbitraryOf(target.schema, pools, target.overrides?.(w, made)) : hostile;
      const ownId = target.id?.(w, made);
      const ids = ownId
        ? fc.oneof(
            { weight: 12, arbitrary: fc.constant(ownId) },
            { weight: 2, arbitrary: fc.constantFrom(...pools.foreign) },
            { weight: 1, arbitrary: fc.constantFrom('not-an-id', '..', '%00', '1e308') },
          )
        : fc.constant('');
      const queries = target.query ?? fc.constant({});
      const seen = { total: 0, server: 0, byStatus: new Map<number, number>() };
      let written = await writesOf(w.company.id);

      await withSession(w[target.as ?? 'admin'], () =>
        fc.assert(
          fc.asyncProperty(bodies, ids, queries, fc.boolean(), async (body, id, query, raw) => {
            // Most bodies go as JSON; some as whatever text the generator made (a bare string, half a document).
            const text = raw && typeof body === 'string' ? body : JSON.stringify(body ?? null);
            const url = `${endpoint.route.replace('[id]', encodeURIComponent(id))}${Object.keys(query).length ? `?${new URLSearchParams(query)}` : ''}`;
            const answer = await call(
              handler,
              url,
              { id },
              {
                method: endpoint.method,
                headers: { 'content-type': 'application/json', ...target.headers?.(text) },
                body: text,
              },
            );
            seen.total += 1;
            seen.byStatus.set(answer.status, (seen.byStatus.get(answer.status) ?? 0) + 1);
            if (answer.status >= 500) seen.server += 1;
            const shown = typeof answer.body === 'string' ? answer.body : JSON.stringify(answer.body);
            expect(answer.status, `${endpoint.key} ${url} ${text.slice(0, 300)} → ${shown.slice(0, 300)}`).toBeLessThan(
              500,
            );
            expect(shown, `${endpoint.key} leaked internals for ${text.slice(0, 200)}`).not.toMatch(LEAK);
            const before = written;
            written = await writesOf(w.company.id);
            if (answer.status >= 400)
              expect(written, `${endpoint.key} answered ${answer.status} but wrote: ${text.slice(0, 300)}`).toBe(
                before,
              );
          }),
          { numRuns: RUNS, endOnFailure: true },
        ),
      );
      const statuses = [...seen.byStatus]
        .sort(([a], [b]) => a - b)
        .map(([s, n]) => `${s}×${n}`)
        .join(' ');
      tally.push(`fuzz ${endpoint.key}: ${seen.total} bodies, ${seen.server} 5xx (${statuses})`);
      expect(seen.server).toBe(0);
      // Bodies name the other company's rows; none of them may change.
      expect(await writesOf(foreign.company.id)).toBe(foreignWrites);
    }, 300_000);
  });
});
