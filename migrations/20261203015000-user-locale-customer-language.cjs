'use strict';
// Languages: a user's own choice of language for the screens (empty = follow the browser's Accept-Language) and
// the language a customer's repair report and e-mail are written in.
const { DataTypes } = require('sequelize');
const { addCheck } = require('../scripts/migration-helpers.cjs');

// Keep in step with LOCALES in i18n/locales.ts.
const LOCALES = "('en', 'es')";

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addColumn(
        'users',
        'locale',
        { type: DataTypes.STRING(8), allowNull: true },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'users',
        'users_locale_check',
        `locale IS NULL OR locale IN ${LOCALES}`,
        transaction,
      );
      await queryInterface.addColumn(
        'customers',
        'language',
        { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'en' },
        { transaction },
      );
      await addCheck(queryInterface, 'customers', 'customers_language_check', `language IN ${LOCALES}`, transaction);
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query(
        'ALTER TABLE "customers" DROP CONSTRAINT IF EXISTS "customers_language_check"',
        { transaction },
      );
      await queryInterface.removeColumn('customers', 'language', { transaction });
      await queryInterface.sequelize.query('ALTER TABLE "users" DROP CONSTRAINT IF EXISTS "users_locale_check"', {
        transaction,
      });
      await queryInterface.removeColumn('users', 'locale', { transaction });
    });
  },
};
