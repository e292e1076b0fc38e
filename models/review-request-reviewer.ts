import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One reviewer named on a review request. */
export class ReviewRequestReviewer extends Model<InferAttributes<ReviewRequestReviewer>, InferCreationAttributes<ReviewRequestReviewer>> {
  declare reviewRequestId: string;
  declare reviewerId: string;

  static initModel(sequelize: Sequelize): void {
    ReviewRequestReviewer.init(
      {
        reviewRequestId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
        reviewerId: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      },
      { sequelize, tableName: 'review_request_reviewers', underscored: true, timestamps: false },
    );
  }
}
