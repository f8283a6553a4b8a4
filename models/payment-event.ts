import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { PAYMENT_PROBLEMS, type PaymentProblem } from '@/lib/domain/vocabulary';

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

export function initPaymentEvent(sequelize: Sequelize) {
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
    { sequelize, modelName: 'PaymentEvent', tableName: 'payment_events', underscored: true, updatedAt: false },
  );
}
