'use strict';

// The insights cache asks "has anything of this company been derived since?" as max(derived_at) per company:
// one index probe instead of a scan.
/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(
      'CREATE INDEX IF NOT EXISTS installs_company_derived_at ON installs (company_id, derived_at)',
    );
  },
  async down(queryInterface) {
    await queryInterface.sequelize.query('DROP INDEX IF EXISTS installs_company_derived_at');
  },
};
