import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { LOCALES, type Locale } from '@/i18n/locales';
import { ROLES, type Role } from '@/lib/domain/vocabulary';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: Role;
  declare active: CreationOptional<boolean>;
  /** Bumped to end every session of this user at once (sign-out everywhere, role change). */
  declare tokenVersion: CreationOptional<number>;
  /** Language of the screens; null follows the browser's Accept-Language. */
  declare locale: CreationOptional<Locale | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUser(sequelize: Sequelize) {
  User.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        unique: true,
        set(value: string) {
          this.setDataValue('email', value.trim().toLowerCase());
        },
      },
      name: { type: DataTypes.STRING(200), allowNull: false },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ROLES] } },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      tokenVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      locale: { type: DataTypes.STRING(8), allowNull: true, validate: { isIn: [LOCALES] } },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    {
      sequelize,
      modelName: 'User',
      tableName: 'users',
      underscored: true,
      defaultScope: { attributes: { exclude: ['passwordHash'] } },
    },
  );
}
