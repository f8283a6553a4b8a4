import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

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

export function initAuditEntry(sequelize: Sequelize) {
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
