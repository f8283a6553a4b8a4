import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { INVOICE_STATUSES } from '@/lib/domain/vocabulary';

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

export function initInvoice(sequelize: Sequelize) {
  Invoice.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.STRING(30), allowNull: false },
      status: {
        type: DataTypes.STRING(12),
        allowNull: false,
        defaultValue: 'draft',
        validate: { isIn: [INVOICE_STATUSES] },
      },
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
    { sequelize, modelName: 'Invoice', tableName: 'invoices', underscored: true },
  );
}
