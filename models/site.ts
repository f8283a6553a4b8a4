import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { decimal } from './columns';
import { ACCESS_POINT_KINDS, PIPE_MATERIALS } from '@/lib/domain';

export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare customerId: string;
  declare name: string;
  declare addressLine: string;
  declare city: string;
  declare region: CreationOptional<string | null>;
  declare postalCode: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

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

export function initSite(sequelize: Sequelize) {
  Site.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      customerId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      addressLine: { type: DataTypes.STRING(300), allowNull: false },
      city: { type: DataTypes.STRING(120), allowNull: false },
      region: DataTypes.STRING(120),
      postalCode: DataTypes.STRING(20),
      notes: DataTypes.TEXT,
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Site', tableName: 'sites', underscored: true },
  );
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
