import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal } from './columns';
import { DEFECT_TYPES, REPAIR_STATUSES } from '@/lib/domain/vocabulary';

/** One defect to be fixed with one patch. */
export class Repair extends Model<InferAttributes<Repair>, InferCreationAttributes<Repair>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare segmentId: string;
  /** The access point the distance is measured from (the segment's upstream end when null). */
  declare fromAccessPointId: CreationOptional<string | null>;
  declare position: CreationOptional<number>;
  declare distanceMm: number;
  declare defectType: (typeof DEFECT_TYPES)[number];
  declare conditionGrade: number;
  declare defectLengthMm: number;
  /** Clock position looking downstream, "3" or a span "10-2". */
  declare clockPosition: CreationOptional<string | null>;
  declare plannedPatchLengthMm: CreationOptional<number | null>;
  /** The packer the office chose on the planning panel, and what the thickness check was run with. */
  declare plannedPackerId: CreationOptional<string | null>;
  declare plannedThicknessMm: CreationOptional<number | null>;
  declare plannedGroundwaterHeadMm: CreationOptional<number | null>;
  declare plannedOvalityPct: CreationOptional<number | null>;
  declare status: CreationOptional<(typeof REPAIR_STATUSES)[number]>;
  declare notes: CreationOptional<string | null>;
  /** The owner's own code for the defect, when the owner requires a coding standard: stored as typed. */
  declare ownerDefectCode: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRepair(sequelize: Sequelize) {
  Repair.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      segmentId: { type: DataTypes.UUID, allowNull: false },
      fromAccessPointId: DataTypes.UUID,
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      distanceMm: { type: DataTypes.INTEGER, allowNull: false },
      defectType: { type: DataTypes.STRING(32), allowNull: false, validate: { isIn: [DEFECT_TYPES] } },
      conditionGrade: { type: DataTypes.SMALLINT, allowNull: false, validate: { min: 1, max: 5 } },
      defectLengthMm: { type: DataTypes.INTEGER, allowNull: false },
      clockPosition: DataTypes.STRING(5),
      plannedPatchLengthMm: DataTypes.INTEGER,
      plannedPackerId: DataTypes.UUID,
      plannedThicknessMm: decimal(5, 2),
      plannedGroundwaterHeadMm: DataTypes.INTEGER,
      plannedOvalityPct: decimal(4, 1),
      status: {
        type: DataTypes.STRING(16),
        allowNull: false,
        defaultValue: 'planned',
        validate: { isIn: [REPAIR_STATUSES] },
      },
      notes: DataTypes.TEXT,
      ownerDefectCode: DataTypes.STRING(60),
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Repair', tableName: 'repairs', underscored: true },
  );
}
