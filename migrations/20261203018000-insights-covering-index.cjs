'use strict';
// Insights read every column they aggregate from one index: (company_id, mixed_at) covering the derived columns
// (an index-only scan, a fraction of the table's pages, which carry the JSON fold). It replaces the plain one.
const COVERED = [
  'crew_id',
  'packer_id',
  'inflated_at',
  'inflate_by',
  'deflated_at',
  'deflate_after',
  'hold_planned_min',
  'max_pressure_kpa',
  'flag_kinds',
];

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const run = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await run(
        `CREATE INDEX installs_company_mixed_cover ON installs (company_id, mixed_at) INCLUDE (${COVERED.join(', ')})`,
      );
      await run('DROP INDEX IF EXISTS installs_company_mixed_at');
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const run = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await run('CREATE INDEX installs_company_mixed_at ON installs (company_id, mixed_at)');
      await run('DROP INDEX IF EXISTS installs_company_mixed_cover');
    });
  },
};
