'use strict';
// Invoices (one per job), their lines, and the payment provider's events we have applied (each once).
// Money is integer cents (INTEGER: up to $21 million a line, plenty for point repairs); the tax rate is in basis points (825 = 8.25 %).
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'invoices',
        {
          id: id(),
          company_id: companyId(),
          job_id: ref('jobs'),
          number: { type: DataTypes.STRING(30), allowNull: false },
          status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'draft' },
          currency: { type: DataTypes.STRING(3), allowNull: false, defaultValue: 'usd' },
          tax_rate_bp: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          subtotal_cents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          tax_cents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          total_cents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
          due_on: { type: DataTypes.DATEONLY, allowNull: false },
          notes: { type: DataTypes.TEXT },
          issued_at: { type: DataTypes.DATE },
          paid_at: { type: DataTypes.DATE },
          paid_cents: { type: DataTypes.INTEGER },
          payment_session_id: { type: DataTypes.STRING(255) },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'invoices',
        'invoices_status_check',
        inList('status', ['draft', 'issued', 'paid', 'void']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'invoices',
        'invoices_money_check',
        'tax_rate_bp BETWEEN 0 AND 5000 AND subtotal_cents >= 0 AND tax_cents >= 0 AND total_cents = subtotal_cents + tax_cents',
        transaction,
      );
      await indexCompany(queryInterface, 'invoices', transaction);
      await queryInterface.addIndex('invoices', ['company_id', 'number'], {
        unique: true,
        name: 'invoices_company_number_unique',
        transaction,
      });
      // One live invoice per job; a voided one may be replaced.
      await queryInterface.sequelize.query(
        `CREATE UNIQUE INDEX invoices_one_live_per_job ON invoices (job_id) WHERE status <> 'void'`,
        { transaction },
      );

      await queryInterface.createTable(
        'invoice_lines',
        {
          id: id(),
          company_id: companyId(),
          invoice_id: ref('invoices', { onDelete: 'CASCADE' }),
          repair_id: ref('repairs', { allowNull: true, onDelete: 'SET NULL' }),
          position: { type: DataTypes.INTEGER, allowNull: false },
          description: { type: DataTypes.STRING(300), allowNull: false },
          quantity: { type: DataTypes.DECIMAL(10, 3), allowNull: false },
          unit_price_cents: { type: DataTypes.INTEGER, allowNull: false },
          amount_cents: { type: DataTypes.INTEGER, allowNull: false },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'invoice_lines',
        'invoice_lines_money_check',
        'quantity > 0 AND unit_price_cents >= 0 AND amount_cents >= 0',
        transaction,
      );
      await indexCompany(queryInterface, 'invoice_lines', transaction);
      await queryInterface.addIndex('invoice_lines', ['invoice_id', 'position'], { unique: true, transaction });

      await queryInterface.createTable(
        'payment_events',
        {
          id: id(),
          company_id: companyId(),
          invoice_id: ref('invoices', { onDelete: 'CASCADE' }),
          provider_event_id: { type: DataTypes.STRING(255), allowNull: false, unique: true },
          type: { type: DataTypes.STRING(80), allowNull: false },
          amount_cents: { type: DataTypes.INTEGER },
          payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
          created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        },
        { transaction },
      );
      await indexCompany(queryInterface, 'payment_events', transaction);
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['payment_events', 'invoice_lines', 'invoices'])
        await queryInterface.dropTable(table, { transaction });
    });
  },
};
