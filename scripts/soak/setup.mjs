// The soak's own invented contractor in setline_soak: one foreman and crew per tablet, one job per crew
// scheduled today with one repair per install the tablet will run. Built with the demo scenario's
// builders (scripts/demo/build.cjs), so the rows are the ones the app expects.
import { createRequire } from 'node:module';
import bcrypt from 'bcryptjs';
import pg from 'pg';
import { Sequelize } from 'sequelize';

const require = createRequire(import.meta.url);
const { buildCompany, insertCompany } = require('../demo/build.cjs');

export const SOAK_PASSWORD = 'setline-soak';
const pad = (n) => String(n + 1).padStart(2, '0');
export const tabletEmail = (i) => `tablet-${pad(i)}@soak.test`;

/** Seeds the company and returns, per tablet, its e-mail, name, repairs and the kit and packer to record. */
export async function seedSoakCompany(databaseUrl, repairsPerTablet) {
  const sequelize = new Sequelize(databaseUrl, { dialect: 'postgres', dialectModule: pg, logging: false });
  try {
    const spec = soakSpec(repairsPerTablet);
    const tables = buildCompany(spec, { now: new Date(), passwordHash: await bcrypt.hash(SOAK_PASSWORD, 10) });
    await sequelize.transaction((transaction) => insertCompany(sequelize.getQueryInterface(), tables, transaction));
    const kit = tables.resin_kits[0];
    const packer = tables.packers[0];
    const checklist = spec.checklists[0].items;
    return {
      companyId: tables.companies[0].id,
      tablets: repairsPerTablet.map((count, i) => {
        const job = tables.jobs[i];
        return {
          index: i,
          email: tabletEmail(i),
          name: spec.users[i].name,
          repairs: tables.repairs.filter((r) => r.job_id === job.id).sort((a, b) => a.position - b.position),
          kitId: kit.id,
          packerId: packer.id,
          checklist,
        };
      }),
    };
  } finally {
    await sequelize.close();
  }
}

function soakSpec(repairsPerTablet) {
  const crews = repairsPerTablet.map((_, i) => ({
    name: `Soak crew ${pad(i)}`,
    daily_capacity: 50,
    members: [tabletEmail(i)],
  }));
  return {
    company: {
      name: 'Soak Test Pipeworks (invented)',
      time_zone: 'UTC',
      unit_system: 'metric',
      min_overlap_per_end_mm: 300,
      working_window_safety_margin: 0.2,
    },
    users: repairsPerTablet.map((_, i) => ({ email: tabletEmail(i), name: `Soak Foreman ${pad(i)}`, role: 'foreman' })),
    crews,
    customers: [
      {
        name: 'Soak Row Property Trust (invented)',
        kind: 'property_manager',
        contact_name: 'Sam Soak',
        email: 'trust@soak.example',
        phone: '555-0100',
      },
    ],
    sites: [
      {
        customer: 0,
        name: 'Soak Row main',
        address_line: '1 Soak Row',
        city: 'Testford',
        region: 'Invented County',
        postal_code: '00000',
        access_points: [
          { label: 'MH-1', kind: 'manhole', depth_mm: 2400 },
          { label: 'MH-2', kind: 'manhole', depth_mm: 2600 },
        ],
        segments: [
          {
            label: 'MH-1 → MH-2',
            from: 0,
            to: 1,
            material: 'vitrified_clay',
            nominal_size_mm: 203,
            inside_diameter_mm: 200,
            length_mm: 90000,
            depth_mm: 2500,
          },
        ],
      },
    ],
    resin_systems: [
      {
        name: 'Soak ambient epoxy',
        chemistry: 'epoxy',
        ref_temp_c: 20,
        pot_life_min: 40,
        hold_min: 90,
        full_cure_min: 240,
        min_temp_c: 5,
        max_temp_c: 35,
        sensitivity_kind: 'doubling',
        doubling_c: 10,
        activation_energy_kj: null,
      },
    ],
    resin_kits: [{ resin: 0, lot: 'SOAK-0001', expires_in_days: 200, quantity_l: 500 }],
    packers: [
      {
        name: '8 in soak packer',
        serial: 'SK-0801',
        min_diameter_mm: 185,
        max_diameter_mm: 215,
        bladder_length_mm: 1600,
        end_margin_mm: 100,
        min_pressure_kpa: 70,
        max_pressure_kpa: 180,
      },
    ],
    checklists: [
      {
        name: 'Soak checks',
        items: [
          { id: 'flow', label: 'Flow stopped or bypassed', required: true },
          { id: 'packer', label: 'Packer, hoses and gauge inspected', required: true },
        ],
      },
    ],
    jobs: repairsPerTablet.map((count, i) => ({
      site: 0,
      crew: i,
      day: 0,
      status: 'scheduled',
      title: `Soak job ${pad(i)}`,
      repairs: Array.from({ length: count }, (_, r) => ({
        // Spread along the 90 m segment; the patch length comes from the company's overlap.
        distance_mm: 1000 + ((r * 3000) % 85000),
        defect_type: 'ring_crack',
        condition_grade: 3,
        defect_length_mm: 200,
        clock_position: '3',
      })),
    })),
  };
}
