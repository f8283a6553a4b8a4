import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal } from './columns';

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

export function initInvoiceLine(sequelize: Sequelize) {
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
    { sequelize, modelName: 'InvoiceLine', tableName: 'invoice_lines', underscored: true },
  );
}
