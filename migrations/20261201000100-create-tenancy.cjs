'use strict';
// Companies (tenants), their users, crews and crew membership.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'companies',
        {
          id: id(),
          name: { type: DataTypes.STRING(200), allowNull: false },
          time_zone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' },
          unit_system: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'imperial' },
          min_overlap_per_end_mm: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 305 },
          working_window_safety_margin: { type: DataTypes.DECIMAL(4, 3), allowNull: false, defaultValue: 0.2 },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'companies',
        'companies_unit_system_check',
        inList('unit_system', ['imperial', 'metric']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'companies',
        'companies_margin_check',
        'working_window_safety_margin >= 0 AND working_window_safety_margin <= 0.9',
        transaction,
      );
      await addCheck(
        queryInterface,
        'companies',
        'companies_overlap_check',
        'min_overlap_per_end_mm >= 0',
        transaction,
      );

      await queryInterface.createTable(
        'users',
        {
          id: id(),
          company_id: companyId(),
          email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
          name: { type: DataTypes.STRING(200), allowNull: false },
          password_hash: { type: DataTypes.STRING(100), allowNull: false },
          role: { type: DataTypes.STRING(16), allowNull: false },
          active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
          token_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'users',
        'users_role_check',
        inList('role', ['admin', 'office', 'foreman', 'technician']),
        transaction,
      );
      await addCheck(queryInterface, 'users', 'users_email_lower_check', 'email = lower(email)', transaction);
      await indexCompany(queryInterface, 'users', transaction);

      await queryInterface.createTable(
        'crews',
        {
          id: id(),
          company_id: companyId(),
          name: { type: DataTypes.STRING(100), allowNull: false },
          daily_capacity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 4 },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(queryInterface, 'crews', 'crews_capacity_check', 'daily_capacity > 0', transaction);
      await queryInterface.addIndex('crews', ['company_id', 'name'], { unique: true, transaction });

      await queryInterface.createTable(
        'crew_members',
        {
          id: id(),
          company_id: companyId(),
          crew_id: ref('crews', { onDelete: 'CASCADE' }),
          user_id: ref('users', { onDelete: 'CASCADE' }),
          ...timestamps(),
        },
        { transaction },
      );
      await indexCompany(queryInterface, 'crew_members', transaction);
      await queryInterface.addIndex('crew_members', ['crew_id', 'user_id'], { unique: true, transaction });
      await queryInterface.addIndex('crew_members', ['user_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['crew_members', 'crews', 'users', 'companies']) {
        await queryInterface.dropTable(table, { transaction });
      }
    });
  },
};
