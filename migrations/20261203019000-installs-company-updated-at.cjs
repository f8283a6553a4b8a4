'use strict';

// The short-lived caches of insights and the severity list (lib/data/company-cache.ts) ask "has any install of this
// company changed since?" as max(updated_at) per company: one index probe instead of a scan.
/** @type {import('sequelize-cli').Migration} */
module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(
      'CREATE INDEX IF NOT EXISTS installs_company_updated_at ON installs (company_id, updated_at)',
    );
  },
  async down(queryInterface) {
    await queryInterface.sequelize.query('DROP INDEX IF EXISTS installs_company_updated_at');
  },
};
