import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One customer link to a job's report. The token names the row; a revoked or missing row refuses the link. */
export class ReportLink extends Model<InferAttributes<ReportLink>, InferCreationAttributes<ReportLink>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare expiresAt: Date;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initReportLink(sequelize: Sequelize) {
  ReportLink.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      revokedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ReportLink', tableName: 'report_links', underscored: true },
  );
}
