import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { REPORT_SEND_STATUSES, type ReportSendStatus } from '@/lib/domain/vocabulary';

/** One request to e-mail a job's repair report; the worker updates it on every try. */
export class ReportSend extends Model<InferAttributes<ReportSend>, InferCreationAttributes<ReportSend>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare toAddress: string;
  declare message: CreationOptional<string | null>;
  declare status: CreationOptional<ReportSendStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare messageId: CreationOptional<string | null>;
  /** When the customer link in this e-mail stops working. */
  declare linkExpiresAt: Date;
  /** The customer link this e-mail carries (report_links); revoking it refuses the link. */
  declare linkId: CreationOptional<string | null>;
  /** When a worker took the row to send it (status `sending`); a stale claim may be taken over. */
  declare claimedAt: CreationOptional<Date | null>;
  /** The pg-boss job that delivers it, written in the same transaction as the row. */
  declare queueJobId: CreationOptional<string | null>;
  declare sentById: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initReportSend(sequelize: Sequelize) {
  ReportSend.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      toAddress: { type: DataTypes.STRING(254), allowNull: false },
      message: DataTypes.TEXT,
      status: {
        type: DataTypes.STRING(12),
        allowNull: false,
        defaultValue: 'queued',
        validate: { isIn: [REPORT_SEND_STATUSES] },
      },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      lastError: DataTypes.TEXT,
      messageId: DataTypes.STRING(300),
      linkExpiresAt: { type: DataTypes.DATE, allowNull: false },
      linkId: DataTypes.UUID,
      claimedAt: DataTypes.DATE,
      queueJobId: DataTypes.UUID,
      sentById: DataTypes.UUID,
      sentAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ReportSend', tableName: 'report_sends', underscored: true },
  );
}
