import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { ATTACHMENT_KINDS, ATTACHMENT_STATUSES, REVIEW_DECISIONS } from '@/lib/domain';

/** A stored file (inspection image, document); the bytes live in object storage under storageKey. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: CreationOptional<string | null>;
  declare repairId: CreationOptional<string | null>;
  declare installId: CreationOptional<string | null>;
  declare kind: (typeof ATTACHMENT_KINDS)[number];
  declare storageKey: string;
  declare thumbnailKey: CreationOptional<string | null>;
  declare contentType: string;
  declare byteSize: number;
  declare originalName: CreationOptional<string | null>;
  declare caption: CreationOptional<string | null>;
  declare uploadedById: CreationOptional<string | null>;
  /** 'pending' until the server has checked the uploaded bytes. */
  declare status: CreationOptional<(typeof ATTACHMENT_STATUSES)[number]>;
  declare width: CreationOptional<number | null>;
  declare height: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** The office's decision on a finished install. */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare installId: string;
  declare reviewerId: string;
  declare decision: (typeof REVIEW_DECISIONS)[number];
  declare comment: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
}

/** Who changed what, when and why. */
export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare userId: CreationOptional<string | null>;
  declare action: string;
  declare entityType: string;
  declare entityId: string;
  declare changes: CreationOptional<Record<string, unknown>>;
  declare reason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initRecords(sequelize: Sequelize) {
  Attachment.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      jobId: DataTypes.UUID,
      repairId: DataTypes.UUID,
      installId: DataTypes.UUID,
      kind: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ATTACHMENT_KINDS] } },
      storageKey: { type: DataTypes.STRING(300), allowNull: false, unique: true },
      thumbnailKey: DataTypes.STRING(300),
      contentType: { type: DataTypes.STRING(100), allowNull: false },
      byteSize: { type: DataTypes.INTEGER, allowNull: false },
      originalName: DataTypes.STRING(255),
      caption: DataTypes.STRING(300),
      uploadedById: DataTypes.UUID,
      status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'pending', validate: { isIn: [ATTACHMENT_STATUSES] } },
      width: DataTypes.INTEGER,
      height: DataTypes.INTEGER,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Attachment', tableName: 'attachments', underscored: true },
  );
  Review.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      installId: { type: DataTypes.UUID, allowNull: false },
      reviewerId: { type: DataTypes.UUID, allowNull: false },
      decision: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [REVIEW_DECISIONS] } },
      comment: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Review', tableName: 'reviews', underscored: true, updatedAt: false },
  );
  AuditEntry.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      userId: DataTypes.UUID,
      action: { type: DataTypes.STRING(40), allowNull: false },
      entityType: { type: DataTypes.STRING(40), allowNull: false },
      entityId: { type: DataTypes.UUID, allowNull: false },
      changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      reason: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'AuditEntry', tableName: 'audit_entries', underscored: true, updatedAt: false },
  );
}
