import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { LOCALES, type Locale } from '@/i18n/locales';
import { CUSTOMER_KINDS } from '@/lib/domain/vocabulary';

export class Customer extends Model<InferAttributes<Customer>, InferCreationAttributes<Customer>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  declare kind: CreationOptional<(typeof CUSTOMER_KINDS)[number]>;
  declare contactName: CreationOptional<string | null>;
  declare email: CreationOptional<string | null>;
  declare phone: CreationOptional<string | null>;
  declare billingAddress: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  /** Language of the customer's repair report, its e-mail and PDF. */
  declare language: CreationOptional<Locale>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCustomer(sequelize: Sequelize) {
  Customer.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      kind: {
        type: DataTypes.STRING(24),
        allowNull: false,
        defaultValue: 'homeowner',
        validate: { isIn: [CUSTOMER_KINDS] },
      },
      contactName: DataTypes.STRING(200),
      email: DataTypes.STRING(254),
      phone: DataTypes.STRING(40),
      billingAddress: DataTypes.TEXT,
      notes: DataTypes.TEXT,
      language: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'en', validate: { isIn: [LOCALES] } },
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Customer', tableName: 'customers', underscored: true },
  );
}
