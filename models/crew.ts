import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class Crew extends Model<InferAttributes<Crew>, InferCreationAttributes<Crew>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  /** Jobs the crew can take on in a day; the schedule marks days booked beyond it. */
  declare dailyCapacity: CreationOptional<number>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCrew(sequelize: Sequelize) {
  Crew.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(100), allowNull: false },
      dailyCapacity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 4 },
      archivedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Crew', tableName: 'crews', underscored: true },
  );
}
