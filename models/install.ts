import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal } from './columns';
import type { StoredFold } from '@/lib/install/derived';
import { INSTALL_STATUSES, type InstallStatus } from '@/lib/domain/vocabulary';

/** One attempt at installing the patch of one repair. */
export class Install extends Model<InferAttributes<Install>, InferCreationAttributes<Install>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare repairId: string;
  declare jobId: string;
  declare crewId: CreationOptional<string | null>;
  declare status: CreationOptional<InstallStatus>;
  declare resinSystemId: CreationOptional<string | null>;
  declare resinKitId: CreationOptional<string | null>;
  declare packerId: CreationOptional<string | null>;
  declare checklistTemplateId: CreationOptional<string | null>;
  declare mixTempC: CreationOptional<number | null>;
  declare pipeTempC: CreationOptional<number | null>;
  declare patchLengthMm: CreationOptional<number | null>;
  declare dryRunSeconds: CreationOptional<number | null>;
  declare noGoOverrideReason: CreationOptional<string | null>;
  declare inspectionResult: CreationOptional<'pass' | 'fail' | null>;
  declare inspectionNotes: CreationOptional<string | null>;
  declare signedOffById: CreationOptional<string | null>;
  declare signedOffAt: CreationOptional<Date | null>;
  declare startedAt: CreationOptional<Date | null>;
  declare finishedAt: CreationOptional<Date | null>;
  /** The install this one redoes (a failed or sent-back patch); both are kept. */
  declare replacesInstallId: CreationOptional<string | null>;
  // Derived from the log in the tap's transaction (see migration 20261203001000); null derivedAt = not yet derived.
  declare step: CreationOptional<string>;
  declare eventCount: CreationOptional<number>;
  declare lastDeviceTime: CreationOptional<Date | null>;
  declare mixedAt: CreationOptional<Date | null>;
  declare inflatedAt: CreationOptional<Date | null>;
  declare deflatedAt: CreationOptional<Date | null>;
  declare inflateBy: CreationOptional<Date | null>;
  declare deflateAfter: CreationOptional<Date | null>;
  declare holdPlannedMin: CreationOptional<number | null>;
  declare maxPressureKpa: CreationOptional<number | null>;
  declare flagKinds: CreationOptional<string[]>;
  declare worstSeverity: CreationOptional<'critical' | 'warning' | null>;
  /** 2 critical, 1 warning, 0 clean: `worstSeverity` as a number the review list orders by (20261203017000). */
  declare severityRank: CreationOptional<number>;
  declare derivedAt: CreationOptional<Date | null>;
  /** The step machine's compact state a tap folds into (lib/install/derived.ts); migration 20261203011000. */
  declare derivedFold: CreationOptional<StoredFold | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initInstall(sequelize: Sequelize) {
  Install.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      repairId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      crewId: DataTypes.UUID,
      status: {
        type: DataTypes.STRING(20),
        allowNull: false,
        defaultValue: 'not_started',
        validate: { isIn: [INSTALL_STATUSES] },
      },
      resinSystemId: DataTypes.UUID,
      resinKitId: DataTypes.UUID,
      packerId: DataTypes.UUID,
      checklistTemplateId: DataTypes.UUID,
      mixTempC: decimal(5, 2),
      pipeTempC: decimal(5, 2),
      patchLengthMm: DataTypes.INTEGER,
      dryRunSeconds: DataTypes.INTEGER,
      noGoOverrideReason: DataTypes.TEXT,
      inspectionResult: DataTypes.STRING(8),
      inspectionNotes: DataTypes.TEXT,
      signedOffById: DataTypes.UUID,
      signedOffAt: DataTypes.DATE,
      startedAt: DataTypes.DATE,
      finishedAt: DataTypes.DATE,
      replacesInstallId: DataTypes.UUID,
      step: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'safety' },
      eventCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      lastDeviceTime: DataTypes.DATE,
      mixedAt: DataTypes.DATE,
      inflatedAt: DataTypes.DATE,
      deflatedAt: DataTypes.DATE,
      inflateBy: DataTypes.DATE,
      deflateAfter: DataTypes.DATE,
      holdPlannedMin: decimal(8, 2),
      maxPressureKpa: decimal(8, 2),
      flagKinds: { type: DataTypes.ARRAY(DataTypes.STRING(32)), allowNull: false, defaultValue: [] },
      worstSeverity: DataTypes.STRING(10),
      severityRank: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 0 },
      derivedAt: DataTypes.DATE,
      derivedFold: DataTypes.JSONB,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Install', tableName: 'installs', underscored: true },
  );
}
