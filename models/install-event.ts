import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { INSTALL_EVENT_TYPES, type InstallEventType } from '@/lib/domain/vocabulary';

/** Append-only evidence: what was tapped on the device and when the server heard of it. */
export class InstallEvent extends Model<InferAttributes<InstallEvent>, InferCreationAttributes<InstallEvent>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare installId: string;
  /** Made on the device; a replay of the same tap carries the same id. */
  declare clientEventId: string;
  declare type: InstallEventType;
  declare deviceTime: Date;
  declare receivedAt: CreationOptional<Date>;
  declare userId: string;
  declare payload: CreationOptional<Record<string, unknown>>;
  declare correctsEventId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initInstallEvent(sequelize: Sequelize) {
  InstallEvent.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      installId: { type: DataTypes.UUID, allowNull: false },
      clientEventId: { type: DataTypes.UUID, allowNull: false },
      type: { type: DataTypes.STRING(24), allowNull: false, validate: { isIn: [INSTALL_EVENT_TYPES] } },
      deviceTime: { type: DataTypes.DATE, allowNull: false },
      receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      userId: { type: DataTypes.UUID, allowNull: false },
      payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      correctsEventId: DataTypes.UUID,
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'InstallEvent', tableName: 'install_events', underscored: true, updatedAt: false },
  );
}
