import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal, tenantRowColumns } from './columns';

/** One lot of resin on hand. */
export class ResinKit extends Model<InferAttributes<ResinKit>, InferCreationAttributes<ResinKit>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare resinSystemId: string;
  declare lot: string;
  declare expiresOn: string;
  declare quantityL: number;
  declare receivedOn: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initResinKit(sequelize: Sequelize) {
  ResinKit.init(
    {
      ...tenantRowColumns(),
      resinSystemId: { type: DataTypes.UUID, allowNull: false },
      lot: { type: DataTypes.STRING(60), allowNull: false },
      expiresOn: { type: DataTypes.DATEONLY, allowNull: false },
      quantityL: decimal(8, 2, { allowNull: false, field: 'quantity_l' }),
      receivedOn: DataTypes.DATEONLY,
      notes: DataTypes.TEXT,
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ResinKit', tableName: 'resin_kits', underscored: true },
  );
}
