import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { ATTACHMENT_KINDS, ATTACHMENT_STATUSES } from '@/lib/domain/vocabulary';

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

export function initAttachment(sequelize: Sequelize) {
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
      status: {
        type: DataTypes.STRING(10),
        allowNull: false,
        defaultValue: 'pending',
        validate: { isIn: [ATTACHMENT_STATUSES] },
      },
      width: DataTypes.INTEGER,
      height: DataTypes.INTEGER,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Attachment', tableName: 'attachments', underscored: true },
  );
}
