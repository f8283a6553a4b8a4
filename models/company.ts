import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal } from './columns';
import { UNIT_SYSTEMS, type UnitSystemName } from '@/lib/domain/vocabulary';

export class Company extends Model<InferAttributes<Company>, InferCreationAttributes<Company>> {
  declare id: CreationOptional<string>;
  declare name: string;
  /** IANA zone; all times are stored in UTC and shown in this zone. */
  declare timeZone: CreationOptional<string>;
  declare unitSystem: CreationOptional<UnitSystemName>;
  declare minOverlapPerEndMm: CreationOptional<number>;
  /** Fraction of the working window kept in reserve (0.2 = inflate with 20 % of the pot life left). */
  declare workingWindowSafetyMargin: CreationOptional<number>;
  /** Share of the resin's hold kept on top of it before deflating (0.1 = deflate after 110 % of the hold). */
  declare holdReserve: CreationOptional<number>;
  /** The liner's short-term flexural modulus for the F1216 X1 checks (MPa); null = the F1216 Table 1 minimum. */
  declare linerShortTermModulusMpa: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCompany(sequelize: Sequelize) {
  Company.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.STRING(200), allowNull: false },
      timeZone: { type: DataTypes.STRING(64), allowNull: false, defaultValue: 'UTC' },
      unitSystem: {
        type: DataTypes.STRING(16),
        allowNull: false,
        defaultValue: 'imperial',
        validate: { isIn: [UNIT_SYSTEMS] },
      },
      minOverlapPerEndMm: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 305 },
      workingWindowSafetyMargin: decimal(4, 3, { allowNull: false, defaultValue: 0.2 }),
      holdReserve: decimal(4, 3, { allowNull: false, defaultValue: 0.1 }),
      linerShortTermModulusMpa: decimal(8, 1),
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Company', tableName: 'companies', underscored: true },
  );
}
