'use strict';
// The review list's severity order without sorting every install: `severity_rank` (2 critical, 1 warning, 0 clean)
// is kept by the same derivation as `worst_severity`. Once an install is mixed and inflated, time passing cannot
// raise its rank any more (lib/data/install-derive.ts), so those rows are ordered straight from the first index;
// the few others (not mixed, or mixed and not inflated yet) get their rank against now() through the second.

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const run = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await run(
        `ALTER TABLE installs ADD COLUMN severity_rank smallint NOT NULL DEFAULT 0
           CONSTRAINT installs_severity_rank_check CHECK (severity_rank IN (0, 1, 2))`,
      );
      await run(
        `UPDATE installs SET severity_rank = CASE worst_severity WHEN 'critical' THEN 2 WHEN 'warning' THEN 1 ELSE 0 END
         WHERE worst_severity IS NOT NULL`,
      );
      await run(
        `CREATE INDEX installs_company_severity_settled ON installs
           (company_id, severity_rank DESC, finished_at ASC NULLS LAST, id)
         WHERE mixed_at IS NOT NULL AND inflated_at IS NOT NULL`,
      );
      await run(
        'CREATE INDEX installs_company_severity_pending ON installs (company_id) WHERE mixed_at IS NULL OR inflated_at IS NULL',
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const run = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await run('DROP INDEX IF EXISTS installs_company_severity_pending');
      await run('DROP INDEX IF EXISTS installs_company_severity_settled');
      await run('ALTER TABLE installs DROP COLUMN IF EXISTS severity_rank');
    });
  },
};
