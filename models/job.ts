import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { JOB_STATUSES, type JobStatus } from '@/lib/domain/vocabulary';

export class Job extends Model<InferAttributes<Job>, InferCreationAttributes<Job>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  /** "YYYY-NNNN", unique per company, never reused (see job_number_sequences). */
  declare number: string;
  declare customerId: string;
  declare siteId: string;
  declare crewId: CreationOptional<string | null>;
  declare status: CreationOptional<JobStatus>;
  /** Calendar day in the company's time zone. */
  declare scheduledDate: CreationOptional<string | null>;
  declare title: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  /** The office's latest send-back comment, shown to the crew on /today. */
  declare reviewComment: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initJob(sequelize: Sequelize) {
  Job.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.STRING(20), allowNull: false },
      customerId: { type: DataTypes.UUID, allowNull: false },
      siteId: { type: DataTypes.UUID, allowNull: false },
      crewId: DataTypes.UUID,
      status: {
        type: DataTypes.STRING(20),
        allowNull: false,
        defaultValue: 'draft',
        validate: { isIn: [JOB_STATUSES] },
      },
      scheduledDate: DataTypes.DATEONLY,
      title: DataTypes.STRING(200),
      notes: DataTypes.TEXT,
      reviewComment: DataTypes.TEXT,
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Job', tableName: 'jobs', underscored: true },
  );
}
