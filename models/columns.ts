import { DataTypes, type Model } from 'sequelize';

/**
 * A NUMERIC column read as a JavaScript number. pg (and Sequelize's own parser) hand NUMERIC back
 * as a string to keep arbitrary precision; our decimals (temperatures, minutes, pressures) fit a double.
 */
export function decimal(
  precision: number,
  scale: number,
  options: { allowNull?: boolean; defaultValue?: number; field?: string } = {},
) {
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull: options.allowNull ?? true,
    ...(options.defaultValue === undefined ? {} : { defaultValue: options.defaultValue }),
    ...(options.field ? { field: options.field } : {}),
    // Sequelize calls a getter with the attribute's name as its first argument.
    get(this: Model, ...args: unknown[]) {
      const value = this.getDataValue(args[0] as never) as unknown;
      return value === null || value === undefined ? value : Number(value);
    },
  };
}

/** The columns every tenant row of the materials tables starts with: id, company, timestamps. */
export function tenantRowColumns() {
  return {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    companyId: { type: DataTypes.UUID, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  };
}
