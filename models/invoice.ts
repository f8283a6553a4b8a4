import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { INVOICE_STATUSES, PAYMENT_PROBLEMS, type PaymentProblem } from '@/lib/domain';
import { decimal } from './columns';

/** What the customer owes for one job: integer cents, tax in basis points. */
export class Invoice extends Model<InferAttributes<Invoice>, InferCreationAttributes<Invoice>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare number: string;
  declare status: CreationOptional<(typeof INVOICE_STATUSES)[number]>;
  declare currency: CreationOptional<string>;
  declare taxRateBp: CreationOptional<number>;
  declare subtotalCents: CreationOptional<number>;
  declare taxCents: CreationOptional<number>;
  declare totalCents: CreationOptional<number>;
  declare dueOn: string;
  declare notes: CreationOptional<string | null>;
  declare issuedAt: CreationOptional<Date | null>;
  declare paidAt: CreationOptional<Date | null>;
  declare paidCents: CreationOptional<number | null>;
  declare paymentSessionId: CreationOptional<string | null>;
  /** A received payment that did not match (second payment, wrong amount or currency): shown until dealt with. */
  declare paymentAlert: CreationOptional<string | null>;
  declare paymentAlertAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class InvoiceLine extends Model<InferAttributes<InvoiceLine>, InferCreationAttributes<InvoiceLine>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare repairId: CreationOptional<string | null>;
  declare position: number;
  declare description: string;
  declare quantity: number;
  declare unitPriceCents: number;
  declare amountCents: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** A payment provider event applied to an invoice; the unique provider id makes a replayed webhook harmless. */
export class PaymentEvent extends Model<InferAttributes<PaymentEvent>, InferCreationAttributes<PaymentEvent>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare providerEventId: string;
  declare type: string;
  declare amountCents: CreationOptional<number | null>;
  declare problem: CreationOptional<PaymentProblem | null>;
  declare payload: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;
}

export function initInvoice(sequelize: Sequelize) {
  const options = (modelName: string, tableName: string) => ({ sequelize, modelName, tableName, underscored: true });
  Invoice.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.STRING(30), allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'draft', validate: { isIn: [INVOICE_STATUSES] } },
      currency: { type: DataTypes.STRING(3), allowNull: false, defaultValue: 'usd' },
      taxRateBp: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      subtotalCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      taxCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      totalCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      dueOn: { type: DataTypes.DATEONLY, allowNull: false },
      notes: DataTypes.TEXT,
      issuedAt: DataTypes.DATE,
      paidAt: DataTypes.DATE,
      paidCents: DataTypes.INTEGER,
      paymentSessionId: DataTypes.STRING(255),
      paymentAlert: DataTypes.TEXT,
      paymentAlertAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    options('Invoice', 'invoices'),
  );
  InvoiceLine.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      invoiceId: { type: DataTypes.UUID, allowNull: false },
      repairId: DataTypes.UUID,
      position: { type: DataTypes.INTEGER, allowNull: false },
      description: { type: DataTypes.STRING(300), allowNull: false },
      quantity: decimal(10, 3, { allowNull: false }),
      unitPriceCents: { type: DataTypes.INTEGER, allowNull: false },
      amountCents: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    options('InvoiceLine', 'invoice_lines'),
  );
  PaymentEvent.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      invoiceId: { type: DataTypes.UUID, allowNull: false },
      providerEventId: { type: DataTypes.STRING(255), allowNull: false },
      type: { type: DataTypes.STRING(80), allowNull: false },
      amountCents: DataTypes.INTEGER,
      problem: { type: DataTypes.STRING(20), validate: { isIn: [PAYMENT_PROBLEMS] } },
      payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      createdAt: DataTypes.DATE,
    },
    { ...options('PaymentEvent', 'payment_events'), updatedAt: false },
  );
}
