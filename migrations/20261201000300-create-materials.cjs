'use strict';
// The company's materials and tools: resin systems and their kits (lots), packers, check-list templates.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'resin_systems',
        {
          id: id(),
          company_id: companyId(),
          name: { type: DataTypes.STRING(120), allowNull: false },
          chemistry: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'epoxy' },
          ref_temp_c: { type: DataTypes.DECIMAL(5, 2), allowNull: false },
          pot_life_min: { type: DataTypes.DECIMAL(7, 2), allowNull: false },
          hold_min: { type: DataTypes.DECIMAL(7, 2), allowNull: false },
          full_cure_min: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
          min_temp_c: { type: DataTypes.DECIMAL(5, 2), allowNull: false },
          max_temp_c: { type: DataTypes.DECIMAL(5, 2), allowNull: false },
          sensitivity_kind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'doubling' },
          doubling_c: { type: DataTypes.DECIMAL(5, 2) },
          activation_energy_kj: { type: DataTypes.DECIMAL(6, 2) },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'resin_systems',
        'resin_systems_chemistry_check',
        inList('chemistry', ['epoxy', 'silicate', 'polyester', 'vinyl_ester', 'other']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'resin_systems',
        'resin_systems_times_check',
        'pot_life_min > 0 AND hold_min > 0 AND full_cure_min >= hold_min AND min_temp_c < max_temp_c',
        transaction,
      );
      await addCheck(
        queryInterface,
        'resin_systems',
        'resin_systems_sensitivity_check',
        "(sensitivity_kind = 'doubling' AND doubling_c > 0) OR (sensitivity_kind = 'arrhenius' AND activation_energy_kj > 0)",
        transaction,
      );
      await indexCompany(queryInterface, 'resin_systems', transaction);

      await queryInterface.createTable(
        'resin_kits',
        {
          id: id(),
          company_id: companyId(),
          resin_system_id: ref('resin_systems'),
          lot: { type: DataTypes.STRING(60), allowNull: false },
          expires_on: { type: DataTypes.DATEONLY, allowNull: false },
          quantity_l: { type: DataTypes.DECIMAL(8, 2), allowNull: false },
          received_on: { type: DataTypes.DATEONLY },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(queryInterface, 'resin_kits', 'resin_kits_quantity_check', 'quantity_l >= 0', transaction);
      await indexCompany(queryInterface, 'resin_kits', transaction);
      await queryInterface.addIndex('resin_kits', ['company_id', 'lot'], { unique: true, transaction });

      await queryInterface.createTable(
        'packers',
        {
          id: id(),
          company_id: companyId(),
          name: { type: DataTypes.STRING(120), allowNull: false },
          serial: { type: DataTypes.STRING(60) },
          min_diameter_mm: { type: DataTypes.INTEGER, allowNull: false },
          max_diameter_mm: { type: DataTypes.INTEGER, allowNull: false },
          bladder_length_mm: { type: DataTypes.INTEGER, allowNull: false },
          end_margin_mm: { type: DataTypes.INTEGER, allowNull: false },
          min_pressure_kpa: { type: DataTypes.DECIMAL(7, 1), allowNull: false },
          max_pressure_kpa: { type: DataTypes.DECIMAL(7, 1), allowNull: false },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'packers',
        'packers_ranges_check',
        'min_diameter_mm > 0 AND max_diameter_mm >= min_diameter_mm AND bladder_length_mm > 0 AND end_margin_mm >= 0 AND min_pressure_kpa >= 0 AND max_pressure_kpa > min_pressure_kpa',
        transaction,
      );
      await indexCompany(queryInterface, 'packers', transaction);

      await queryInterface.createTable(
        'checklist_templates',
        {
          id: id(),
          company_id: companyId(),
          name: { type: DataTypes.STRING(120), allowNull: false },
          items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
          active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'checklist_templates',
        'checklist_templates_items_check',
        "jsonb_typeof(items) = 'array'",
        transaction,
      );
      await indexCompany(queryInterface, 'checklist_templates', transaction);
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['checklist_templates', 'packers', 'resin_kits', 'resin_systems']) {
        await queryInterface.dropTable(table, { transaction });
      }
    });
  },
};
