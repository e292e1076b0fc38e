import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const REVIEW_STATES = ['requested', 'approved', 'changes_requested', 'withdrawn'] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

/**
 * A request that named reviewers look at one revision of a circuit. It turns
 * stale when a newer revision is saved: what was (or would be) approved is no
 * longer what the circuit holds.
 */
export class ReviewRequest extends Model<InferAttributes<ReviewRequest>, InferCreationAttributes<ReviewRequest>> {
  declare id: CreationOptional<string>;
  declare circuitId: string;
  declare revisionId: string;
  declare requestedById: string;
  declare message: string;
  declare state: CreationOptional<ReviewState>;
  declare stale: CreationOptional<boolean>;
  declare staleAt: CreationOptional<Date | null>;
  declare decidedById: CreationOptional<string | null>;
  declare decidedAt: CreationOptional<Date | null>;
  declare decisionNote: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ReviewRequest.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        circuitId: { type: DataTypes.UUID, allowNull: false },
        revisionId: { type: DataTypes.UUID, allowNull: false },
        requestedById: { type: DataTypes.UUID, allowNull: false },
        message: { type: DataTypes.TEXT, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'requested', validate: { isIn: [[...REVIEW_STATES]] } },
        stale: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        staleAt: { type: DataTypes.DATE, allowNull: true },
        decidedById: { type: DataTypes.UUID, allowNull: true },
        decidedAt: { type: DataTypes.DATE, allowNull: true },
        decisionNote: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'review_requests', underscored: true },
    );
  }
}
