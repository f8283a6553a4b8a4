import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { REVIEW_DECISIONS } from '@/lib/domain/vocabulary';

/** The office's decision on a finished install. */
export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare installId: string;
  declare reviewerId: string;
  declare decision: (typeof REVIEW_DECISIONS)[number];
  declare comment: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initReview(sequelize: Sequelize) {
  Review.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      companyId: { type: DataTypes.UUID, allowNull: false },
      installId: { type: DataTypes.UUID, allowNull: false },
      reviewerId: { type: DataTypes.UUID, allowNull: false },
      decision: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [REVIEW_DECISIONS] } },
      comment: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
    },
    { sequelize, modelName: 'Review', tableName: 'reviews', underscored: true, updatedAt: false },
  );
}
