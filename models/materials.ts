import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { decimal } from './columns';
import { RESIN_CHEMISTRIES, SENSITIVITY_KINDS } from '@/lib/domain';

/** A resin product's clock at its reference temperature, as its data sheet gives it. */
export class ResinSystem extends Model<InferAttributes<ResinSystem>, InferCreationAttributes<ResinSystem>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  declare chemistry: CreationOptional<(typeof RESIN_CHEMISTRIES)[number]>;
  declare refTempC: number;
  declare potLifeMin: number;
  declare holdMin: number;
  declare fullCureMin: number;
  declare minTempC: number;
  declare maxTempC: number;
  declare sensitivityKind: CreationOptional<(typeof SENSITIVITY_KINDS)[number]>;
  declare doublingC: CreationOptional<number | null>;
  declare activationEnergyKj: CreationOptional<number | null>;
  /** Resin to fabric by volume in the wet-out laminate, and the extra mixed beyond it (%), for the resin quantity. */
  declare resinToFabricRatio: CreationOptional<number>;
  declare resinExcessPct: CreationOptional<number>;
  /** Default minutes from mixing until the patch is on the packer (wet-out and loading). */
  declare prepMinutes: CreationOptional<number>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** One lot of resin on hand. */
export class ResinKit extends Model<InferAttributes<ResinKit>, InferCreationAttributes<ResinKit>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare resinSystemId: string;
  declare lot: string;
  declare expiresOn: string;
  declare quantityL: number;
  declare receivedOn: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Packer extends Model<InferAttributes<Packer>, InferCreationAttributes<Packer>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  declare serial: CreationOptional<string | null>;
  declare minDiameterMm: number;
  declare maxDiameterMm: number;
  declare bladderLengthMm: number;
  /** Bare bladder to leave beyond each end of the patch. */
  declare endMarginMm: number;
  declare minPressureKpa: number;
  declare maxPressureKpa: number;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export type ChecklistItem = { id: string; label: string; required: boolean };

export class ChecklistTemplate extends Model<InferAttributes<ChecklistTemplate>, InferCreationAttributes<ChecklistTemplate>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  /** Ordered: the crew sees them in this order. */
  declare items: ChecklistItem[];
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

const base = {
  id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
  companyId: { type: DataTypes.UUID, allowNull: false },
  createdAt: DataTypes.DATE,
  updatedAt: DataTypes.DATE,
};

export function initMaterials(sequelize: Sequelize) {
  ResinSystem.init(
    {
      ...base,
      name: { type: DataTypes.STRING(120), allowNull: false },
      chemistry: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'epoxy', validate: { isIn: [RESIN_CHEMISTRIES] } },
      refTempC: decimal(5, 2, { allowNull: false }),
      potLifeMin: decimal(7, 2, { allowNull: false }),
      holdMin: decimal(7, 2, { allowNull: false }),
      fullCureMin: decimal(8, 2, { allowNull: false }),
      minTempC: decimal(5, 2, { allowNull: false }),
      maxTempC: decimal(5, 2, { allowNull: false }),
      sensitivityKind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'doubling', validate: { isIn: [SENSITIVITY_KINDS] } },
      doublingC: decimal(5, 2),
      activationEnergyKj: decimal(6, 2, { field: 'activation_energy_kj' }),
      resinToFabricRatio: decimal(4, 2, { allowNull: false, defaultValue: 1 }),
      resinExcessPct: decimal(4, 1, { allowNull: false, defaultValue: 10 }),
      prepMinutes: decimal(6, 2, { allowNull: false, defaultValue: 15 }),
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ResinSystem', tableName: 'resin_systems', underscored: true },
  );
  ResinKit.init(
    {
      ...base,
      resinSystemId: { type: DataTypes.UUID, allowNull: false },
      lot: { type: DataTypes.STRING(60), allowNull: false },
      expiresOn: { type: DataTypes.DATEONLY, allowNull: false },
      quantityL: decimal(8, 2, { allowNull: false, field: 'quantity_l' }),
      receivedOn: DataTypes.DATEONLY,
      notes: DataTypes.TEXT,
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ResinKit', tableName: 'resin_kits', underscored: true },
  );
  Packer.init(
    {
      ...base,
      name: { type: DataTypes.STRING(120), allowNull: false },
      serial: DataTypes.STRING(60),
      minDiameterMm: { type: DataTypes.INTEGER, allowNull: false },
      maxDiameterMm: { type: DataTypes.INTEGER, allowNull: false },
      bladderLengthMm: { type: DataTypes.INTEGER, allowNull: false },
      endMarginMm: { type: DataTypes.INTEGER, allowNull: false },
      minPressureKpa: decimal(7, 1, { allowNull: false }),
      maxPressureKpa: decimal(7, 1, { allowNull: false }),
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Packer', tableName: 'packers', underscored: true },
  );
  ChecklistTemplate.init(
    {
      ...base,
      name: { type: DataTypes.STRING(120), allowNull: false },
      items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    },
    { sequelize, modelName: 'ChecklistTemplate', tableName: 'checklist_templates', underscored: true },
  );
}
