import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare customerId: string;
  declare name: string;
  declare addressLine: string;
  declare city: string;
  declare region: CreationOptional<string | null>;
  declare postalCode: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initSite(sequelize: Sequelize) {
  Site.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      customerId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      addressLine: { type: DataTypes.STRING(300), allowNull: false },
      city: { type: DataTypes.STRING(120), allowNull: false },
      region: DataTypes.STRING(120),
      postalCode: DataTypes.STRING(20),
      notes: DataTypes.TEXT,
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Site', tableName: 'sites', underscored: true },
  );
}
