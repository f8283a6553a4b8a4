'use strict';
// Resin kits get notes and can be archived: a kit an install used must stay readable for the review and the report.
const { DataTypes } = require('sequelize');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn('resin_kits', 'notes', { type: DataTypes.TEXT }, { transaction });
      await queryInterface.addColumn('resin_kits', 'archived_at', { type: DataTypes.DATE }, { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeColumn('resin_kits', 'archived_at', { transaction });
      await queryInterface.removeColumn('resin_kits', 'notes', { transaction });
    });
  },
};
