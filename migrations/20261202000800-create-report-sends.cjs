'use strict';
// The send log of repair reports: one row per "Send repair report", updated by the worker on each try.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'report_sends',
        {
          id: id(),
          company_id: companyId(),
          job_id: ref('jobs', { onDelete: 'CASCADE' }),
          to_address: { type: DataTypes.STRING(254), allowNull: false },
          message: { type: DataTypes.TEXT },
          status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'queued' },
          attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          last_error: { type: DataTypes.TEXT },
          message_id: { type: DataTypes.STRING(300) },
          link_expires_at: { type: DataTypes.DATE, allowNull: false },
          sent_by_id: ref('users', { allowNull: true, onDelete: 'SET NULL' }),
          sent_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'report_sends',
        'report_sends_status_check',
        inList('status', ['queued', 'sent', 'failed']),
        transaction,
      );
      await addCheck(queryInterface, 'report_sends', 'report_sends_attempts_check', 'attempts >= 0', transaction);
      await indexCompany(queryInterface, 'report_sends', transaction);
      await queryInterface.addIndex('report_sends', ['job_id', 'created_at'], { transaction });
    });
  },
  async down(queryInterface) {
    await queryInterface.dropTable('report_sends');
  },
};
