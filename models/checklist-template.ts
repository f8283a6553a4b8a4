import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { tenantRowColumns } from './columns';

export type ChecklistItem = { id: string; label: string; required: boolean };

export class ChecklistTemplate extends Model<
  InferAttributes<ChecklistTemplate>,
  InferCreationAttributes<ChecklistTemplate>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  /** Ordered: the crew sees them in this order. */
  declare items: ChecklistItem[];
  declare active: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initChecklistTemplate(sequelize: Sequelize) {
  ChecklistTemplate.init(
    {
      ...tenantRowColumns(),
      name: { type: DataTypes.STRING(120), allowNull: false },
      items: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    },
    { sequelize, modelName: 'ChecklistTemplate', tableName: 'checklist_templates', underscored: true },
  );
}
