import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal, tenantRowColumns } from './columns';

export class Packer extends Model<InferAttributes<Packer>, InferCreationAttributes<Packer>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  declare serial: CreationOptional<string | null>;
  declare minDiameterMm: number;
  declare maxDiameterMm: number;
  declare bladderLengthMm: number;
  /** Bare bladder to leave beyond each end of the patch. */
  declare endMarginMm: number;
  declare minPressureKpa: number;
  declare maxPressureKpa: number;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initPacker(sequelize: Sequelize) {
  Packer.init(
    {
      ...tenantRowColumns(),
      name: { type: DataTypes.STRING(120), allowNull: false },
      serial: DataTypes.STRING(60),
      minDiameterMm: { type: DataTypes.INTEGER, allowNull: false },
      maxDiameterMm: { type: DataTypes.INTEGER, allowNull: false },
      bladderLengthMm: { type: DataTypes.INTEGER, allowNull: false },
      endMarginMm: { type: DataTypes.INTEGER, allowNull: false },
      minPressureKpa: decimal(7, 1, { allowNull: false }),
      maxPressureKpa: decimal(7, 1, { allowNull: false }),
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Packer', tableName: 'packers', underscored: true },
  );
}
