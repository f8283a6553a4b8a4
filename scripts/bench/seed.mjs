// Seeds the bench's installs into the demo company of a fresh bench database, against the running server:
// a few template installs are recorded through the real tap route (so their derived columns are the app's own),
// then cloned in SQL (generate_series, jsonb_populate_record) up to BENCH_INSTALLS installs in all, each on a
// repair and job of its own. Writes the ids the figures need as JSON to the path in argv[3].
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import pg from 'pg';
import { signIn } from './lib.mjs';

const base = process.argv[2];
const out = process.argv[3];
const TOTAL = Number(process.env.BENCH_INSTALLS ?? 10_000);
const TAP_INSTALLS = 20; // (c) 20 tablets, one install each
const LATENCY_INSTALLS = Number(process.env.BENCH_LATENCY_INSTALLS ?? 50); // (d) installs at 10 and at 1,000 events
const LONG_EVENTS = 1000;

const db = new pg.Client({ connectionString: process.env.DATABASE_URL });
await db.connect();
const one = async (sql, params = []) => (await db.query(sql, params)).rows[0];

const company = await one(
  `SELECT c.id, u.id AS foreman_id FROM users u JOIN companies c ON c.id = u.company_id WHERE u.email = 'foreman@demo.test'`,
);
const crew = await one(`SELECT cm.crew_id AS id FROM crew_members cm WHERE cm.user_id = $1 LIMIT 1`, [
  company.foreman_id,
]);
const place = await one(
  `SELECT s.id AS segment_id, s.site_id, si.customer_id, (SELECT defect_type FROM repairs WHERE company_id = $1 LIMIT 1) AS defect_type
   FROM segments s JOIN sites si ON si.id = s.site_id WHERE s.company_id = $1 ORDER BY s.created_at LIMIT 1`,
  [company.id],
);
const kit = await one(
  `SELECT k.id FROM resin_kits k JOIN resin_systems r ON r.id = k.resin_system_id
   WHERE k.company_id = $1 AND k.expires_on > now() + interval '30 days' AND r.min_temp_c <= 20 AND r.max_temp_c >= 20 AND k.archived_at IS NULL
   ORDER BY r.pot_life_min DESC LIMIT 1`,
  [company.id],
);
const packer = await one(
  `SELECT id FROM packers WHERE company_id = $1 AND archived_at IS NULL ORDER BY max_pressure_kpa LIMIT 1`,
  [company.id],
);

// One job per 20 repairs, done over the last 60 days by the foreman's crew; a slot number per repair.
const jobs = Math.ceil(TOTAL / 20);
await db.query('BEGIN');
await db.query(`CREATE TABLE bench_slots (slot int PRIMARY KEY, repair_id uuid NOT NULL, job_id uuid NOT NULL)`);
await db.query(
  `WITH j AS (
     INSERT INTO jobs (id, company_id, number, customer_id, site_id, crew_id, status, scheduled_date, title, created_at, updated_at)
     SELECT gen_random_uuid(), $1, '2025-B' || lpad(g::text, 5, '0'), $2, $3, $4, 'awaiting_review',
            (now() - (g % 60) * interval '1 day')::date, 'Bench job ' || g, now(), now()
     FROM generate_series(1, $5::int) g
     RETURNING id, number)
   INSERT INTO bench_slots (slot, repair_id, job_id)
   SELECT (substr(j.number, 7)::int - 1) * 20 + k, gen_random_uuid(), j.id FROM j, generate_series(1, 20) k`,
  [company.id, place.customer_id, place.site_id, crew.id, jobs],
);
await db.query(`DELETE FROM bench_slots WHERE slot > $1::int`, [TOTAL]);
await db.query(
  `INSERT INTO repairs (id, company_id, job_id, segment_id, position, distance_mm, defect_type, condition_grade, defect_length_mm, status, created_at, updated_at)
   SELECT s.repair_id, $1, s.job_id, $2, (s.slot - 1) % 20 + 1, 1000 + ((s.slot - 1) % 20) * 500, $3, 3, 300, 'installed', now(), now()
   FROM bench_slots s`,
  [company.id, place.segment_id, place.defect_type],
);
await db.query('COMMIT');

// Template installs, recorded through the tap route two days back (device times must be within 14 days).
const cookie = await signIn(base, 'foreman@demo.test');
const t0 = Date.now() - 2 * 24 * 3600_000;
const at = (min) => new Date(t0 + min * 60_000).toISOString();
const tap = (type, min, payload = {}) => ({ clientEventId: randomUUID(), type, deviceTime: at(min), payload });
const conditions = {
  mixTempC: 20,
  airTempC: 20,
  prepMinutes: 5,
  pipeTempC: 20,
  resinKitId: kit.id,
  packerId: packer.id,
  patchLengthMm: 910,
};

function scenario({ inflate = 30, deflate = 130, pressure = 100, dryRun = true, finish = true }) {
  return [
    tap('safety_acknowledged', 0),
    tap('checks_done', 4, { items: [{ id: 'flow', ok: true }] }),
    ...(dryRun ? [tap('dry_run_started', 8), tap('dry_run_finished', 10, { seconds: 120 })] : []),
    tap('conditions_recorded', 12, conditions),
    tap('go_decision', 13, { go: true }),
    tap('resin_mixed', 15),
    tap('patch_loaded', 20),
    tap('packer_in_position', 25),
    tap('bladder_inflated', 15 + inflate, { pressureKpa: 100 }),
    tap('pressure_reading', 15 + inflate + 20, { pressureKpa: pressure }),
    ...(finish
      ? [
          tap('bladder_deflated', 15 + inflate + deflate),
          tap('inspection_recorded', 15 + inflate + deflate + 10, { result: 'pass' }),
          tap('signed_off', 15 + inflate + deflate + 15, { name: 'Bench Foreman' }),
        ]
      : []),
  ];
}

// The share of each kind of install among the clones (the "running" one is also what the tap figures use).
const TEMPLATES = [
  { name: 'clean', share: 0.5, taps: scenario({}) },
  { name: 'late-inflate', share: 0.15, taps: scenario({ inflate: 60 }) },
  { name: 'early-deflate', share: 0.15, taps: scenario({ deflate: 40 }) },
  { name: 'pressure-no-dry-run', share: 0.1, taps: scenario({ pressure: 900, dryRun: false }) },
  { name: 'running', share: 0.1, taps: scenario({ finish: false }) },
];

async function post(path, body) {
  const res = await fetch(base + path, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  if (res.status !== 201) throw new Error(`${path} answered ${res.status}: ${await res.text()}`);
  return res.json();
}

let slot = 1;
const templateIds = {};
for (const template of TEMPLATES) {
  const { repair_id: repairId } = await one('SELECT repair_id FROM bench_slots WHERE slot = $1', [slot++]);
  const id = randomUUID();
  await post('/api/installs', { id, repairId });
  for (const event of template.taps) await post(`/api/installs/${id}/events`, event);
  templateIds[template.name] = id;
}

/** Clones the template into slots [from, to]: the install row (derived columns included) and its events. */
async function clone(templateId, from, to) {
  if (to < from) return [];
  await db.query('BEGIN');
  const { rows } = await db.query(
    `INSERT INTO installs
     SELECT (jsonb_populate_record(NULL::installs, to_jsonb(t) || jsonb_build_object(
       'id', gen_random_uuid(), 'repair_id', s.repair_id, 'job_id', s.job_id,
       'status', CASE WHEN t.status = 'awaiting_review' AND s.slot % 3 <> 0 THEN 'approved' ELSE t.status END))).*
     FROM installs t JOIN bench_slots s ON s.slot BETWEEN $2 AND $3 WHERE t.id = $1
     RETURNING id`,
    [templateId, from, to],
  );
  await db.query(
    `INSERT INTO install_events
     SELECT (jsonb_populate_record(NULL::install_events, to_jsonb(e) || jsonb_build_object(
       'id', gen_random_uuid(), 'client_event_id', gen_random_uuid(), 'install_id', i.id))).*
     FROM installs i JOIN bench_slots s ON s.repair_id = i.repair_id AND s.slot BETWEEN $2 AND $3
     JOIN install_events e ON e.install_id = $1`,
    [templateId, from, to],
  );
  await db.query('COMMIT');
  return rows.map((r) => r.id);
}

// Slots after the templates: the tap figures' installs first (clones of the running one), then the rest by share.
const tapInstalls = await clone(templateIds.running, slot, slot + TAP_INSTALLS - 1);
slot += TAP_INSTALLS;
const shortInstalls = await clone(templateIds.running, slot, slot + LATENCY_INSTALLS - 1);
slot += LATENCY_INSTALLS;
const longInstalls = await clone(templateIds.running, slot, slot + LATENCY_INSTALLS - 1);
slot += LATENCY_INSTALLS;
// The long logs: notes between the checks and the mix (they change nothing of the state, only the count).
await db.query(
  `INSERT INTO install_events (id, company_id, install_id, client_event_id, type, device_time, received_at, user_id, payload, created_at)
   SELECT gen_random_uuid(), $1, i, gen_random_uuid(), 'note', $3::timestamptz + g * interval '100 milliseconds', now(), $4,
          jsonb_build_object('text', 'Flow check ' || g), now()
   FROM unnest($2::uuid[]) i, generate_series(1, $5::int) g`,
  [company.id, longInstalls, at(5), company.foreman_id, LONG_EVENTS - TEMPLATES.at(-1).taps.length],
);
await db.query(
  `UPDATE installs SET event_count = (SELECT count(*) FROM install_events e WHERE e.install_id = installs.id) WHERE id = ANY($1)`,
  [longInstalls],
);

const remaining = TOTAL - slot + 1;
for (const [index, template] of TEMPLATES.entries()) {
  const count = index === TEMPLATES.length - 1 ? TOTAL - slot + 1 : Math.round(remaining * template.share);
  await clone(templateIds[template.name], slot, slot + count - 1);
  slot += count;
}
await db.query('DROP TABLE bench_slots');
// Settled before anything is timed: the clones' pages vacuumed and the statistics fresh, so autovacuum does not
// start on them in the middle of a figure.
await db.query('VACUUM (ANALYZE)');
const counts = await one(
  `SELECT count(*)::int AS installs, (SELECT count(*)::int FROM install_events WHERE company_id = $1) AS events,
          count(*) FILTER (WHERE derived_at IS NULL)::int AS underived
   FROM installs WHERE company_id = $1`,
  [company.id],
);
await db.end();
fs.writeFileSync(out, JSON.stringify({ templateIds, tapInstalls, shortInstalls, longInstalls, counts }, null, 2));
console.error(`[bench] seeded ${counts.installs} installs and ${counts.events} events in the demo company`);
