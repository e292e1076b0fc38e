import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { JOB_STATUSES, type JobStatus } from './job-status';


/** An exhaustive timing search of one revision against a rules text, worked by a job worker. */
export class Proof extends Model<InferAttributes<Proof>, InferCreationAttributes<Proof>> {
  declare id: CreationOptional<string>;
  declare revisionId: string;
  /** The rules text as it was when the proof started; the circuit's rules may change since. */
  declare rulesText: string;
  declare variations: unknown;
  declare quantumS: number;
  declare steps: number;
  declare settleS: number;
  declare status: CreationOptional<JobStatus>;
  declare progress: unknown;
  declare result: unknown;
  declare error: string | null;
  declare createdById: string;
  declare startedAt: Date | null;
  declare finishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Proof.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        revisionId: { type: DataTypes.UUID, allowNull: false },
        rulesText: { type: DataTypes.TEXT, allowNull: false },
        variations: { type: DataTypes.JSONB, allowNull: false },
        quantumS: { type: DataTypes.DOUBLE, allowNull: false },
        steps: { type: DataTypes.INTEGER, allowNull: false },
        settleS: { type: DataTypes.DOUBLE, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued', validate: { isIn: [[...JOB_STATUSES]] } },
        progress: { type: DataTypes.JSONB, allowNull: true },
        result: { type: DataTypes.JSONB, allowNull: true },
        error: { type: DataTypes.TEXT, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: false },
        startedAt: { type: DataTypes.DATE, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'proofs', underscored: true },
    );
  }
}
