'use strict';
// How much resin a patch takes comes from the resin system: its resin-to-fabric ratio (by volume) and the excess
// mixed beyond what the laminate holds. Defaults are the common-practice values of lib/sizing/resin-quantity.ts.
const { DataTypes } = require('sequelize');
const { addCheck } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'resin_systems',
        'resin_to_fabric_ratio',
        { type: DataTypes.DECIMAL(4, 2), allowNull: false, defaultValue: 1 },
        { transaction },
      );
      await queryInterface.addColumn(
        'resin_systems',
        'resin_excess_pct',
        { type: DataTypes.DECIMAL(4, 1), allowNull: false, defaultValue: 10 },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'resin_systems',
        'resin_systems_quantity_check',
        'resin_to_fabric_ratio > 0 AND resin_to_fabric_ratio <= 5 AND resin_excess_pct >= 0 AND resin_excess_pct <= 100',
        transaction,
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE "resin_systems" DROP CONSTRAINT IF EXISTS "resin_systems_quantity_check"',
        { transaction },
      );
      await queryInterface.removeColumn('resin_systems', 'resin_excess_pct', { transaction });
      await queryInterface.removeColumn('resin_systems', 'resin_to_fabric_ratio', { transaction });
    });
  },
};
