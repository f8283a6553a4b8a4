'use strict';
// The clock counts the whole pull and keeps a hold reserve; a failed or sent-back patch can be redone.
// - resin_systems.prep_minutes: default minutes from mixing until the patch is on the packer (wet-out and loading).
// - companies.hold_reserve: share of the hold kept on top of it before deflating (0.10 = 10 % longer).
// - installs.replaces_install_id: the install a redo replaces; one redo per install, both kept.
const { DataTypes, Op } = require('sequelize');
const { addCheck } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      // From memory: wetting out and wrapping a short patch takes about 10–20 min; 15 until the admin sets the maker's figure.
      await queryInterface.addColumn(
        'resin_systems',
        'prep_minutes',
        { type: DataTypes.DECIMAL(6, 2), allowNull: false, defaultValue: 15 },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'resin_systems',
        'resin_systems_prep_minutes_check',
        'prep_minutes >= 0 AND prep_minutes <= 240',
        transaction,
      );
      // Project choice: a 10 % hold reserve unless the company sets its own.
      await queryInterface.addColumn(
        'companies',
        'hold_reserve',
        { type: DataTypes.DECIMAL(4, 3), allowNull: false, defaultValue: 0.1 },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'companies',
        'companies_hold_reserve_check',
        'hold_reserve >= 0 AND hold_reserve <= 1',
        transaction,
      );
      await queryInterface.addColumn(
        'installs',
        'replaces_install_id',
        { type: DataTypes.UUID, allowNull: true, references: { model: 'installs', key: 'id' }, onDelete: 'NO ACTION' },
        { transaction },
      );
      await queryInterface.addIndex('installs', ['replaces_install_id'], {
        unique: true,
        name: 'installs_replaces_install_unique',
        where: { replaces_install_id: { [Op.ne]: null } },
        transaction,
      });
      await addCheck(
        queryInterface,
        'installs',
        'installs_replaces_other_check',
        'replaces_install_id IS NULL OR replaces_install_id <> id',
        transaction,
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeIndex('installs', 'installs_replaces_install_unique', { transaction });
      await queryInterface.removeColumn('installs', 'replaces_install_id', { transaction });
      await queryInterface.removeColumn('companies', 'hold_reserve', { transaction });
      await queryInterface.removeColumn('resin_systems', 'prep_minutes', { transaction });
    });
  },
};
