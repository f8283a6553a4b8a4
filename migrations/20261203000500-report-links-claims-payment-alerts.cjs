'use strict';
// Trust in the close-out: revocable customer links (one row per link; the token names the row), a claimed
// state for report sends so no two workers mail the same one, and payment problems kept visible.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'report_links',
        {
          id: id(),
          company_id: companyId(),
          job_id: ref('jobs', { onDelete: 'CASCADE' }),
          expires_at: { type: DataTypes.DATE, allowNull: false },
          revoked_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await indexCompany(queryInterface, 'report_links', transaction);
      await queryInterface.addIndex('report_links', ['job_id'], { transaction });

      await queryInterface.addColumn(
        'report_sends',
        'link_id',
        ref('report_links', { allowNull: true, onDelete: 'SET NULL' }),
        { transaction },
      );
      await queryInterface.addColumn('report_sends', 'claimed_at', { type: DataTypes.DATE }, { transaction });
      await queryInterface.addColumn('report_sends', 'queue_job_id', { type: DataTypes.UUID }, { transaction });
      await queryInterface.sequelize.query('ALTER TABLE report_sends DROP CONSTRAINT report_sends_status_check', {
        transaction,
      });
      await addCheck(
        queryInterface,
        'report_sends',
        'report_sends_status_check',
        inList('status', ['queued', 'sending', 'sent', 'failed']),
        transaction,
      );
      // The sweeper looks for rows that wait too long.
      await queryInterface.addIndex('report_sends', ['status', 'updated_at'], {
        name: 'report_sends_status_updated',
        where: { status: ['queued', 'sending'] },
        transaction,
      });

      await queryInterface.addColumn('payment_events', 'problem', { type: DataTypes.STRING(20) }, { transaction });
      await addCheck(
        queryInterface,
        'payment_events',
        'payment_events_problem_check',
        `problem IS NULL OR ${inList('problem', ['already_paid', 'amount', 'currency', 'not_open'])}`,
        transaction,
      );
      await queryInterface.addColumn('invoices', 'payment_alert', { type: DataTypes.TEXT }, { transaction });
      await queryInterface.addColumn('invoices', 'payment_alert_at', { type: DataTypes.DATE }, { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeColumn('invoices', 'payment_alert_at', { transaction });
      await queryInterface.removeColumn('invoices', 'payment_alert', { transaction });
      await queryInterface.removeColumn('payment_events', 'problem', { transaction });
      await queryInterface.removeIndex('report_sends', 'report_sends_status_updated', { transaction });
      // Rows caught mid-send go back to the queue before the narrower check returns.
      await queryInterface.sequelize.query(`UPDATE report_sends SET status = 'queued' WHERE status = 'sending'`, {
        transaction,
      });
      await queryInterface.sequelize.query('ALTER TABLE report_sends DROP CONSTRAINT report_sends_status_check', {
        transaction,
      });
      await addCheck(
        queryInterface,
        'report_sends',
        'report_sends_status_check',
        inList('status', ['queued', 'sent', 'failed']),
        transaction,
      );
      await queryInterface.removeColumn('report_sends', 'queue_job_id', { transaction });
      await queryInterface.removeColumn('report_sends', 'claimed_at', { transaction });
      await queryInterface.removeColumn('report_sends', 'link_id', { transaction });
      await queryInterface.dropTable('report_links', { transaction });
    });
  },
};
