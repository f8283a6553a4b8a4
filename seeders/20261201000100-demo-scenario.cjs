'use strict';
// The demo scenario: two invented contractors. Runs only into an empty database.
const bcrypt = require('bcryptjs');
const { buildCompany, insertCompany } = require('../scripts/demo/build.cjs');
const main = require('../scripts/demo/scenario-main.cjs');
const second = require('../scripts/demo/scenario-second.cjs');

const DEMO_PASSWORD = 'setline-demo';

module.exports = {
  async up(queryInterface) {
    const [[{ count }]] = await queryInterface.sequelize.query('SELECT count(*)::int AS count FROM companies');
    if (count > 0) throw new Error('The demo scenario seeds only an empty database: run `npm run db:reset` first.');
    const now = new Date();
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 12);
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const spec of [main, second]) {
        await insertCompany(queryInterface, buildCompany(spec, { now, passwordHash }), transaction);
      }
    });
  },

  async down(queryInterface) {
    const names = [main.company.name, second.company.name];
    // The install log and audit trail refuse deletes (append-only triggers). Taking the demo out is
    // the one deliberate exception: only the tables' owner may switch those triggers off, and only
    // inside this transaction.
    await queryInterface.sequelize.transaction(async (transaction) => {
      const guarded = ['install_events', 'audit_entries'];
      for (const table of guarded)
        await queryInterface.sequelize.query(`ALTER TABLE ${table} DISABLE TRIGGER USER`, { transaction });
      await queryInterface.bulkDelete('companies', { name: names }, { transaction });
      for (const table of guarded)
        await queryInterface.sequelize.query(`ALTER TABLE ${table} ENABLE TRIGGER USER`, { transaction });
    });
  },
};
