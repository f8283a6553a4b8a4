import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { decimal, tenantRowColumns } from './columns';
import { RESIN_CHEMISTRIES, SENSITIVITY_KINDS } from '@/lib/domain/vocabulary';

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

export function initResinSystem(sequelize: Sequelize) {
  ResinSystem.init(
    {
      ...tenantRowColumns(),
      name: { type: DataTypes.STRING(120), allowNull: false },
      chemistry: {
        type: DataTypes.STRING(16),
        allowNull: false,
        defaultValue: 'epoxy',
        validate: { isIn: [RESIN_CHEMISTRIES] },
      },
      refTempC: decimal(5, 2, { allowNull: false }),
      potLifeMin: decimal(7, 2, { allowNull: false }),
      holdMin: decimal(7, 2, { allowNull: false }),
      fullCureMin: decimal(8, 2, { allowNull: false }),
      minTempC: decimal(5, 2, { allowNull: false }),
      maxTempC: decimal(5, 2, { allowNull: false }),
      sensitivityKind: {
        type: DataTypes.STRING(16),
        allowNull: false,
        defaultValue: 'doubling',
        validate: { isIn: [SENSITIVITY_KINDS] },
      },
      doublingC: decimal(5, 2),
      activationEnergyKj: decimal(6, 2, { field: 'activation_energy_kj' }),
      resinToFabricRatio: decimal(4, 2, { allowNull: false, defaultValue: 1 }),
      resinExcessPct: decimal(4, 1, { allowNull: false, defaultValue: 10 }),
      prepMinutes: decimal(6, 2, { allowNull: false, defaultValue: 15 }),
      archivedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'ResinSystem', tableName: 'resin_systems', underscored: true },
  );
}
