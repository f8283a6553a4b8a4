'use strict';
// What a tap changes about its install, kept on the install's row in the tap's own transaction, so a tap never
// re-reads the whole log and the office's lists, the live board and the insights read columns, not replays.
// `derived_at` is null until the row has been derived once (rows from before this migration are filled by the
// app's own derivation, which knows the resin clock).
const { DataTypes } = require('sequelize');

const COLUMNS = {
  step: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'safety' },
  event_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  last_device_time: { type: DataTypes.DATE, allowNull: true },
  mixed_at: { type: DataTypes.DATE, allowNull: true },
  inflated_at: { type: DataTypes.DATE, allowNull: true },
  deflated_at: { type: DataTypes.DATE, allowNull: true },
  inflate_by: { type: DataTypes.DATE, allowNull: true },
  deflate_after: { type: DataTypes.DATE, allowNull: true },
  hold_planned_min: { type: DataTypes.DECIMAL(8, 2), allowNull: true },
  max_pressure_kpa: { type: DataTypes.DECIMAL(8, 2), allowNull: true },
  flag_kinds: { type: DataTypes.ARRAY(DataTypes.STRING(32)), allowNull: false, defaultValue: [] },
  worst_severity: { type: DataTypes.STRING(10), allowNull: true },
  derived_at: { type: DataTypes.DATE, allowNull: true },
};

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const [name, spec] of Object.entries(COLUMNS))
        await queryInterface.addColumn('installs', name, spec, { transaction });
      await queryInterface.sequelize.query(
        `ALTER TABLE installs ADD CONSTRAINT installs_worst_severity_check CHECK (worst_severity IS NULL OR worst_severity IN ('critical', 'warning'))`,
        { transaction },
      );
      await queryInterface.addIndex('installs', ['company_id', 'mixed_at'], {
        name: 'installs_company_mixed_at',
        transaction,
      });
      await queryInterface.addIndex('installs', ['company_id', 'worst_severity'], {
        name: 'installs_company_worst_severity',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeIndex('installs', 'installs_company_worst_severity', { transaction });
      await queryInterface.removeIndex('installs', 'installs_company_mixed_at', { transaction });
      await queryInterface.sequelize.query(
        'ALTER TABLE installs DROP CONSTRAINT IF EXISTS installs_worst_severity_check',
        { transaction },
      );
      for (const name of Object.keys(COLUMNS).reverse())
        await queryInterface.removeColumn('installs', name, { transaction });
    });
  },
};
