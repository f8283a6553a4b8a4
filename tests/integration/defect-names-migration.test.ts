import { createRequire } from 'node:module';
import pg from 'pg';
import { Sequelize } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/data/db';

// The migration runs up and down on a copy of the repairs table in a scratch schema of the real PostgreSQL,
// so the test database the other files use is never altered.
const require = createRequire(import.meta.url);
const migration = require('../../migrations/20261202001210-own-defect-names.cjs') as {
  RENAMES: [string, string][];
  up: (qi: unknown) => Promise<void>;
  down: (qi: unknown) => Promise<void>;
};
const SCHEMA = 'scratch_defect_names';
const OLD = migration.RENAMES.map(([from]) => from);

describe('migration 20261202001210-own-defect-names: stored defect codes up and down', () => {
  let scoped: Sequelize;
  beforeAll(async () => {
    await sequelize.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE; CREATE SCHEMA ${SCHEMA};`);
    await sequelize.query(`CREATE TABLE ${SCHEMA}.repairs (id serial PRIMARY KEY, defect_type varchar(32) NOT NULL,
      CONSTRAINT repairs_defect_type_check CHECK (defect_type IN (${OLD.map((c) => `'${c}'`).join(', ')})))`);
    await sequelize.query(
      `INSERT INTO ${SCHEMA}.repairs (defect_type) VALUES ${OLD.map((c) => `('${c}')`).join(', ')}`,
    );
    scoped = new Sequelize(process.env.DATABASE_URL!, {
      dialect: 'postgres',
      dialectModule: pg,
      logging: false,
      dialectOptions: { options: `-c search_path=${SCHEMA}` },
    });
  });
  afterAll(async () => {
    await scoped?.close();
    await sequelize.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE`);
  });

  const codes = async () =>
    (await scoped.query('SELECT defect_type FROM repairs ORDER BY id', { plain: false, raw: true }))[0].map(
      (r) => (r as { defect_type: string }).defect_type,
    );
  const refuses = async (code: string) =>
    scoped.query(`INSERT INTO repairs (defect_type) VALUES ('${code}')`).then(
      () => false,
      () => true,
    );

  it('up renames every stored code to our own, adds the owner’s code column and refuses the old codes', async () => {
    await migration.up(scoped.getQueryInterface());
    expect(await codes()).toEqual(migration.RENAMES.map(([, to]) => to));
    expect(await codes()).not.toContain('crack_longitudinal');
    expect(await refuses('crack_longitudinal')).toBe(true);
    expect(await refuses('lengthwise_crack')).toBe(false);
    await scoped.query('DELETE FROM repairs WHERE id > 14');
    const [columns] = await scoped.query(
      `SELECT column_name FROM information_schema.columns WHERE table_schema = '${SCHEMA}' AND table_name = 'repairs'`,
    );
    expect(columns.map((c) => (c as { column_name: string }).column_name)).toContain('owner_defect_code');
  });

  it('down restores every row as it was and drops the column', async () => {
    await migration.down(scoped.getQueryInterface());
    expect(await codes()).toEqual(OLD);
    expect(await refuses('lengthwise_crack')).toBe(true);
    const [columns] = await scoped.query(
      `SELECT column_name FROM information_schema.columns WHERE table_schema = '${SCHEMA}' AND table_name = 'repairs'`,
    );
    expect(columns.map((c) => (c as { column_name: string }).column_name)).not.toContain('owner_defect_code');
    // The real table of the test database was not touched.
    const [real] = await sequelize.query(
      "SELECT 1 FROM information_schema.columns WHERE table_schema = 'public' AND table_name = 'repairs' AND column_name = 'owner_defect_code'",
    );
    expect(real).toHaveLength(1);
  });
});
