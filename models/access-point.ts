import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { ACCESS_POINT_KINDS } from '@/lib/domain/vocabulary';

export class AccessPoint extends Model<InferAttributes<AccessPoint>, InferCreationAttributes<AccessPoint>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare siteId: string;
  declare label: string;
  declare kind: (typeof ACCESS_POINT_KINDS)[number];
  declare depthMm: CreationOptional<number | null>;
  declare notes: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initAccessPoint(sequelize: Sequelize) {
  AccessPoint.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      siteId: { type: DataTypes.UUID, allowNull: false },
      label: { type: DataTypes.STRING(60), allowNull: false },
      kind: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ACCESS_POINT_KINDS] } },
      depthMm: DataTypes.INTEGER,
      notes: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'AccessPoint', tableName: 'access_points', underscored: true },
  );
}
