'use strict';
// The step machine's compact state beside the derived columns of 20261203001000: what a tap folds its one event
// into (lib/install/derived.ts), so an ordinary tap never re-reads the install's log. A partial index finds the
// rows not derived yet (made before the derivation, or by a seed), which the app derives on first read or tap.
const { DataTypes } = require('sequelize');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'installs',
        'derived_fold',
        { type: DataTypes.JSONB, allowNull: true },
        { transaction },
      );
      await queryInterface.sequelize.query(
        'CREATE INDEX installs_company_underived ON installs (company_id) WHERE derived_at IS NULL',
        { transaction },
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query('DROP INDEX IF EXISTS installs_company_underived', { transaction });
      await queryInterface.removeColumn('installs', 'derived_fold', { transaction });
    });
  },
};
