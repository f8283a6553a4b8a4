import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal } from './columns';
import { PIPE_MATERIALS } from '@/lib/domain/vocabulary';

/** A pipe run between two access points (the far end may be unknown, e.g. a lateral to the main). */
export class Segment extends Model<InferAttributes<Segment>, InferCreationAttributes<Segment>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare siteId: string;
  declare fromAccessPointId: string;
  declare toAccessPointId: CreationOptional<string | null>;
  declare label: string;
  declare material: (typeof PIPE_MATERIALS)[number];
  declare nominalSizeMm: number;
  declare insideDiameterMm: number;
  declare lengthMm: number;
  declare depthMm: CreationOptional<number | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initSegment(sequelize: Sequelize) {
  Segment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      siteId: { type: DataTypes.UUID, allowNull: false },
      fromAccessPointId: { type: DataTypes.UUID, allowNull: false },
      toAccessPointId: DataTypes.UUID,
      label: { type: DataTypes.STRING(60), allowNull: false },
      material: { type: DataTypes.STRING(24), allowNull: false, validate: { isIn: [PIPE_MATERIALS] } },
      nominalSizeMm: { type: DataTypes.INTEGER, allowNull: false },
      insideDiameterMm: decimal(7, 1, { allowNull: false }),
      lengthMm: { type: DataTypes.INTEGER, allowNull: false },
      depthMm: DataTypes.INTEGER,
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Segment', tableName: 'segments', underscored: true },
  );
}
