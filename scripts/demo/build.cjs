'use strict';
// Builders for the invented demo scenario: rows for bulkInsert, dates relative to "now" so the
// scenario always has past, today's and coming work. Every name, address and number here is made up.
// Plans, clocks and money come from the app's own TypeScript modules (domain.cjs), never from copies here.
const { randomUUID } = require('node:crypto');
const { TZDate } = require('@date-fns/tz');
const { dayInZone, invoiceTotals, patchLength, resinClockSpec, timeFactor } = require('./domain.cjs');

const MIN = 60_000;
const DAY = 86_400_000;

/** YYYY-MM-DD of an instant in a time zone (lib/dates). */
const dayIn = (instant, timeZone) => dayInZone(instant, timeZone);

/** The instant of local hh:mm on the calendar day `offsetDays` from now, in the zone. */
function localTime(now, timeZone, offsetDays, hh, mm) {
  const [y, m, d] = dayIn(new Date(now.getTime() + offsetDays * DAY), timeZone)
    .split('-')
    .map(Number);
  return new Date(new TZDate(y, m - 1, d, hh, mm, 0, timeZone).getTime());
}

/** Stamps id, company and timestamps on a row. */
function row(companyId, fields, now) {
  return { id: randomUUID(), company_id: companyId, created_at: now, updated_at: now, ...fields };
}

/** A resin row (snake_case, as inserted) as the clock's spec (lib/cure/resin-spec). */
const clockSpecOf = (resin) =>
  resinClockSpec({
    refTempC: resin.ref_temp_c,
    potLifeMin: resin.pot_life_min,
    holdMin: resin.hold_min,
    fullCureMin: resin.full_cure_min,
    minTempC: resin.min_temp_c,
    maxTempC: resin.max_temp_c,
    sensitivityKind: resin.sensitivity_kind,
    doublingC: resin.doubling_c ?? null,
    activationEnergyKj: resin.activation_energy_kj ?? null,
  });

/** A resin time at the reference temperature moved to another temperature (lib/cure timeFactor). */
function corrected(minutes, resin, tempC) {
  const spec = clockSpecOf(resin);
  return minutes * timeFactor(spec.sensitivity, spec.refTempC, tempC);
}

/**
 * The event log of a finished install. `shape` bends it: 'clean', 'late-inflate' (inflated after the
 * working window ran out) or 'early-deflate' (deflated before the hold time was up).
 */
function installEvents({
  companyId,
  installId,
  userId,
  start,
  resin,
  mixTempC,
  pipeTempC,
  kit,
  packer,
  patchLengthMm,
  shape,
  foremanName,
  checklist,
}) {
  const events = [];
  const add = (type, atMs, payload = {}) =>
    events.push({
      id: randomUUID(),
      company_id: companyId,
      install_id: installId,
      client_event_id: randomUUID(),
      type,
      device_time: new Date(atMs),
      // Devices with a signal deliver in a second or two; the demo keeps that gap.
      received_at: new Date(atMs + 1500),
      user_id: userId,
      payload: JSON.stringify(payload),
      corrects_event_id: null,
      created_at: new Date(atMs + 1500),
    });
  const t0 = start.getTime();
  const window = corrected(resin.pot_life_min, resin, mixTempC);
  const hold = corrected(resin.hold_min, resin, pipeTempC);
  add('safety_acknowledged', t0);
  add('checks_done', t0 + 4 * MIN, { items: checklist.map((item) => ({ id: item.id, ok: true })) });
  add('dry_run_started', t0 + 8 * MIN);
  add('dry_run_finished', t0 + 8 * MIN + 210_000, { seconds: 210 });
  add('conditions_recorded', t0 + 13 * MIN, {
    mixTempC,
    pipeTempC,
    resinKitId: kit.id,
    packerId: packer.id,
    patchLengthMm,
  });
  add('go_decision', t0 + 14 * MIN, { go: true });
  const mixed = t0 + 16 * MIN;
  add('resin_mixed', mixed);
  add('patch_loaded', mixed + 7 * MIN);
  add('packer_in_position', mixed + 12 * MIN);
  const inflateAfter = shape === 'late-inflate' ? window + 6 : Math.min(window * 0.6, 16);
  const inflated = mixed + inflateAfter * MIN;
  add('bladder_inflated', inflated, { pressureKpa: 103 });
  add('pressure_reading', inflated + 30 * MIN, { pressureKpa: 101 });
  // A careful crew keeps the hold plus the company's default 10 % hold reserve, and a few minutes more.
  const holdFor = shape === 'early-deflate' ? hold * 0.6 : hold * 1.1 + 8;
  const deflated = inflated + holdFor * MIN;
  add(
    'bladder_deflated',
    deflated,
    shape === 'early-deflate' ? { reason: 'Flow backing up at the upstream manhole' } : {},
  );
  add('inspection_recorded', deflated + 15 * MIN, {
    result: 'pass',
    notes: 'Patch tight to the wall, ends smooth, no wrinkles seen on camera.',
  });
  add('signed_off', deflated + 20 * MIN, { name: foremanName });
  return { events, startedAt: new Date(t0), finishedAt: new Date(deflated + 20 * MIN) };
}

module.exports = { MIN, DAY, dayIn, localTime, row, corrected, clockSpecOf, installEvents };

/**
 * Turns a company's scenario spec into rows, table by table, in foreign-key order.
 * Jobs name their site, crew and installs by index into the spec's lists.
 */
function buildCompany(spec, { now, passwordHash }) {
  const tz = spec.company.time_zone;
  const company = { id: randomUUID(), created_at: now, updated_at: now, ...spec.company };
  const C = company.id;
  const t = {};
  t.companies = [company];
  t.users = spec.users.map((u) =>
    row(C, { locale: null, ...u, password_hash: passwordHash, active: true, token_version: 0 }, now),
  );
  const userByEmail = Object.fromEntries(t.users.map((u) => [u.email, u]));
  t.crews = spec.crews.map((c) => row(C, { name: c.name, daily_capacity: c.daily_capacity }, now));
  t.crew_members = spec.crews.flatMap((c, i) =>
    c.members.map((email) => row(C, { crew_id: t.crews[i].id, user_id: userByEmail[email].id }, now)),
  );
  // Every row names its language: bulkInsert would send NULL, not the column default, for a missing key.
  t.customers = spec.customers.map((c) => row(C, { language: 'en', ...c }, now));
  t.sites = [];
  t.access_points = [];
  t.segments = [];
  for (const s of spec.sites) {
    const site = row(
      C,
      {
        customer_id: t.customers[s.customer].id,
        name: s.name,
        address_line: s.address_line,
        city: s.city,
        region: s.region,
        postal_code: s.postal_code,
        notes: s.notes ?? null,
      },
      now,
    );
    t.sites.push(site);
    const points = s.access_points.map((p) => row(C, { site_id: site.id, ...p }, now));
    t.access_points.push(...points);
    site.points = points;
    site.segs = s.segments.map((g) =>
      row(
        C,
        {
          site_id: site.id,
          from_access_point_id: points[g.from].id,
          to_access_point_id: g.to == null ? null : points[g.to].id,
          label: g.label,
          material: g.material,
          nominal_size_mm: g.nominal_size_mm,
          inside_diameter_mm: g.inside_diameter_mm,
          length_mm: g.length_mm,
          depth_mm: g.depth_mm ?? null,
        },
        now,
      ),
    );
    t.segments.push(...site.segs);
  }
  t.resin_systems = spec.resin_systems.map((r) => row(C, r, now));
  t.resin_kits = spec.resin_kits.map((k) =>
    row(
      C,
      {
        resin_system_id: t.resin_systems[k.resin].id,
        lot: k.lot,
        expires_on: dayIn(new Date(now.getTime() + k.expires_in_days * DAY), tz),
        quantity_l: k.quantity_l,
        received_on: dayIn(new Date(now.getTime() - 60 * DAY), tz),
      },
      now,
    ),
  );
  t.packers = spec.packers.map((p) => row(C, p, now));
  t.checklist_templates = spec.checklists.map((c) =>
    row(C, { name: c.name, items: JSON.stringify(c.items), active: true }, now),
  );
  const year = Number(dayIn(now, tz).slice(0, 4));
  t.job_number_sequences = [{ company_id: C, year, last_number: spec.jobs.length }];
  t.jobs = [];
  t.repairs = [];
  t.installs = [];
  t.install_events = [];
  t.reviews = [];
  t.invoices = [];
  t.invoice_lines = [];
  spec.jobs.forEach((j, index) => {
    const site = t.sites[j.site];
    const crew = j.crew == null ? null : t.crews[j.crew];
    const job = row(
      C,
      {
        number: `${year}-${String(index + 1).padStart(4, '0')}`,
        customer_id: site.customer_id,
        site_id: site.id,
        crew_id: crew ? crew.id : null,
        status: j.status,
        scheduled_date: j.day == null ? null : dayIn(new Date(now.getTime() + j.day * DAY), tz),
        title: j.title,
        notes: j.notes ?? null,
        review_comment: j.review_comment ?? null,
      },
      now,
    );
    t.jobs.push(job);
    j.repairs.forEach((r, position) => {
      const segment = site.segs[r.segment ?? 0];
      // The app's patch length (lib/sizing): the defect plus the company's overlap at each end, not rounded.
      const patch = patchLength({
        defectLengthMm: r.defect_length_mm,
        overlapPerEndMm: spec.company.min_overlap_per_end_mm,
      });
      const repair = row(
        C,
        {
          job_id: job.id,
          segment_id: segment.id,
          from_access_point_id: segment.from_access_point_id,
          position: position + 1,
          distance_mm: r.distance_mm,
          defect_type: r.defect_type,
          condition_grade: r.condition_grade,
          defect_length_mm: r.defect_length_mm,
          clock_position: r.clock_position ?? null,
          planned_patch_length_mm: patch,
          status: j.install ? 'installed' : 'planned',
          notes: null,
        },
        now,
      );
      t.repairs.push(repair);
      if (!j.install) return;
      const foreman = t.users.find(
        (u) => u.role === 'foreman' && t.crew_members.some((m) => m.user_id === u.id && m.crew_id === crew.id),
      );
      const resin = t.resin_systems[j.install.resin ?? 0];
      const kit = t.resin_kits.find((k) => k.resin_system_id === resin.id && k.expires_on > job.scheduled_date);
      const packer = t.packers.find(
        (p) =>
          p.min_diameter_mm <= segment.inside_diameter_mm &&
          segment.inside_diameter_mm <= p.max_diameter_mm &&
          p.bladder_length_mm - 2 * p.end_margin_mm >= patch,
      );
      if (!kit || !packer) throw new Error(`demo data: no kit or packer for job ${job.number}`);
      const installId = randomUUID();
      const start = localTime(now, tz, j.day, 8 + position * 3, 15);
      const shape = position === 0 ? (j.install.shape ?? 'clean') : 'clean';
      const log = installEvents({
        companyId: C,
        installId,
        userId: foreman.id,
        start,
        resin,
        mixTempC: j.install.mix_temp_c,
        pipeTempC: j.install.pipe_temp_c,
        kit,
        packer,
        patchLengthMm: patch,
        shape,
        foremanName: foreman.name,
        checklist: spec.checklists[0].items,
      });
      const install = {
        ...row(
          C,
          {
            repair_id: repair.id,
            job_id: job.id,
            crew_id: crew.id,
            status: j.install.status,
            resin_system_id: resin.id,
            resin_kit_id: kit.id,
            packer_id: packer.id,
            checklist_template_id: t.checklist_templates[0].id,
            mix_temp_c: j.install.mix_temp_c,
            pipe_temp_c: j.install.pipe_temp_c,
            patch_length_mm: patch,
            dry_run_seconds: 210,
            no_go_override_reason: null,
            inspection_result: 'pass',
            inspection_notes: 'Patch tight to the wall, ends smooth, no wrinkles seen on camera.',
            signed_off_by_id: foreman.id,
            signed_off_at: log.finishedAt,
            started_at: log.startedAt,
            finished_at: log.finishedAt,
          },
          now,
        ),
        id: installId,
      };
      t.installs.push(install);
      t.install_events.push(...log.events);
      if (j.install.status === 'approved' || j.install.status === 'sent_back') {
        const office = t.users.find((u) => u.role === 'office');
        t.reviews.push({
          id: randomUUID(),
          company_id: C,
          install_id: install.id,
          reviewer_id: office.id,
          decision: j.install.status,
          comment: j.install.status === 'sent_back' ? j.review_comment : null,
          created_at: new Date(log.finishedAt.getTime() + 3 * 3600_000),
        });
      }
    });
  });
  spec.jobs.forEach((j, index) => {
    if (j.invoice) addInvoice(t, C, t.jobs[index], j.invoice, now);
  });
  t.report_sends = [];
  spec.jobs.forEach((j, index) => {
    if (j.status === 'reported' || j.status === 'closed') addReportSend(t, C, t.jobs[index], now);
  });
  for (const site of t.sites) {
    delete site.points;
    delete site.segs;
  }
  return t;
}

/**
 * The send-log row of a job whose repair report went out: one delivered try to the customer, a day after the
 * last install of the job finished, by the office user (as "Send repair report" writes it).
 */
function addReportSend(t, C, job, now) {
  const customer = t.customers.find((c) => c.id === job.customer_id);
  const office = t.users.find((u) => u.role === 'office');
  const finished = t.installs.filter((i) => i.job_id === job.id).map((i) => i.finished_at.getTime());
  const sentAt = new Date((finished.length ? Math.max(...finished) : now.getTime() - 2 * DAY) + DAY);
  t.report_sends.push({
    ...row(
      C,
      {
        job_id: job.id,
        to_address: customer.email,
        message: null,
        status: 'sent',
        attempts: 1,
        last_error: null,
        message_id: `<${randomUUID()}@setline.invalid>`,
        link_expires_at: new Date(sentAt.getTime() + 30 * DAY),
        sent_by_id: office.id,
        sent_at: sentAt,
      },
      now,
    ),
    created_at: sentAt,
    updated_at: sentAt,
  });
}

/**
 * An invoice of one line per repair of the job, at an invented price; amounts, tax and totals from the app's
 * own lib/invoice/money.ts.
 */
function addInvoice(t, C, job, spec, now) {
  const repairs = t.repairs.filter((r) => r.job_id === job.id);
  const invoice = row(
    C,
    {
      job_id: job.id,
      number: `INV-${job.number}`,
      status: spec.status,
      currency: spec.currency ?? 'usd',
      tax_rate_bp: spec.tax_rate_bp,
      due_on: dayIn(new Date(now.getTime() + (spec.due_in_days ?? 30) * DAY), 'UTC'),
      issued_at: now,
      notes: null,
    },
    now,
  );
  const lines = repairs.map((repair, i) =>
    row(
      C,
      {
        invoice_id: invoice.id,
        repair_id: repair.id,
        position: i + 1,
        description: `Point repair ${repair.position}: ${repair.defect_type.replace(/_/g, ' ')} at ${(repair.distance_mm / 304.8).toFixed(0)} ft`,
        quantity: 1,
        unit_price_cents: spec.price_cents,
        amount_cents: spec.price_cents,
      },
      now,
    ),
  );
  const totals = invoiceTotals(
    lines.map((line) => ({ quantity: line.quantity, unitPriceCents: line.unit_price_cents })),
    spec.tax_rate_bp,
  );
  lines.forEach((line, i) => {
    line.amount_cents = totals.amounts[i];
  });
  Object.assign(invoice, {
    subtotal_cents: totals.subtotalCents,
    tax_cents: totals.taxCents,
    total_cents: totals.totalCents,
    paid_at: spec.status === 'paid' ? now : null,
    paid_cents: spec.status === 'paid' ? totals.totalCents : null,
  });
  t.invoices.push(invoice);
  t.invoice_lines.push(...lines);
}

const TABLE_ORDER = [
  'companies',
  'users',
  'crews',
  'crew_members',
  'customers',
  'sites',
  'access_points',
  'segments',
  'resin_systems',
  'resin_kits',
  'packers',
  'checklist_templates',
  'job_number_sequences',
  'jobs',
  'repairs',
  'installs',
  'install_events',
  'reviews',
  'invoices',
  'invoice_lines',
  'report_sends',
];

async function insertCompany(queryInterface, tables, transaction) {
  for (const table of TABLE_ORDER) {
    if (tables[table]?.length) await queryInterface.bulkInsert(table, tables[table], { transaction });
  }
}

module.exports.buildCompany = buildCompany;
module.exports.insertCompany = insertCompany;
