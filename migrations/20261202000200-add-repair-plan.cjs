'use strict';
// What the office saves from a repair's planning panel: the chosen packer, the laminate thickness and
// the groundwater head and ovality the thickness was checked against (the patch length already has a column).
const { DataTypes } = require('sequelize');
const { ref, addCheck } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'repairs',
        'planned_packer_id',
        ref('packers', { allowNull: true, onDelete: 'SET NULL' }),
        { transaction },
      );
      await queryInterface.addColumn(
        'repairs',
        'planned_thickness_mm',
        { type: DataTypes.DECIMAL(5, 2) },
        { transaction },
      );
      await queryInterface.addColumn(
        'repairs',
        'planned_groundwater_head_mm',
        { type: DataTypes.INTEGER },
        { transaction },
      );
      await queryInterface.addColumn(
        'repairs',
        'planned_ovality_pct',
        { type: DataTypes.DECIMAL(4, 1) },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'repairs',
        'repairs_plan_check',
        '(planned_thickness_mm IS NULL OR planned_thickness_mm > 0) AND (planned_groundwater_head_mm IS NULL OR planned_groundwater_head_mm >= 0)' +
          ' AND (planned_ovality_pct IS NULL OR (planned_ovality_pct >= 0 AND planned_ovality_pct < 100))',
        transaction,
      );
      await queryInterface.addIndex('repairs', ['planned_packer_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query('ALTER TABLE "repairs" DROP CONSTRAINT IF EXISTS "repairs_plan_check"', {
        transaction,
      });
      for (const column of [
        'planned_ovality_pct',
        'planned_groundwater_head_mm',
        'planned_thickness_mm',
        'planned_packer_id',
      ]) {
        await queryInterface.removeColumn('repairs', column, { transaction });
      }
    });
  },
};
