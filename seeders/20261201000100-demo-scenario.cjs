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
    await queryInterface.bulkDelete('companies', { name: names });
  },
};
