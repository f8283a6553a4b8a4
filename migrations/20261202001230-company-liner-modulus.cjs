'use strict';
// The liner's short-term (initial) flexural modulus the repair plan's F1216 X1 checks use, per company (it is a
// property of the tube and resin the company installs). Empty means the F1216 Table 1 minimum, 250 000 psi.
const { DataTypes } = require('sequelize');
const { addCheck } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'companies',
        'liner_short_term_modulus_mpa',
        { type: DataTypes.DECIMAL(8, 1), allowNull: true },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'companies',
        'companies_liner_modulus_check',
        'liner_short_term_modulus_mpa IS NULL OR (liner_short_term_modulus_mpa >= 500 AND liner_short_term_modulus_mpa <= 50000)',
        transaction,
      );
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE "companies" DROP CONSTRAINT IF EXISTS "companies_liner_modulus_check"',
        { transaction },
      );
      await queryInterface.removeColumn('companies', 'liner_short_term_modulus_mpa', { transaction });
    });
  },
};
