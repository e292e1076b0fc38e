import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { JOB_STATUSES, type JobStatus } from './job-status';

export const RUN_KINDS = ['live', 'scenario', 'proof', 'replay'] as const;

/** One simulation of one revision; the trace itself lives in object storage at traceKey. */
export class Run extends Model<InferAttributes<Run>, InferCreationAttributes<Run>> {
  declare id: CreationOptional<string>;
  declare revisionId: string;
  declare kind: (typeof RUN_KINDS)[number];
  /** What the person who saved it called it; null when they gave no name. */
  declare name: string | null;
  declare status: JobStatus;
  declare inputs: unknown;
  declare summary: unknown;
  declare traceKey: string | null;
  declare createdById: string;
  /** The proof whose counterexample this run replays; null for every other kind. */
  declare proofId: CreationOptional<string | null>;
  /** The field log this run replays (kind 'replay'); null for every other kind. */
  declare uploadId: CreationOptional<string | null>;
  declare finishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Run.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        revisionId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false, validate: { isIn: [[...RUN_KINDS]] } },
        name: { type: DataTypes.TEXT, allowNull: true },
        status: { type: DataTypes.TEXT, allowNull: false, validate: { isIn: [[...JOB_STATUSES]] } },
        inputs: { type: DataTypes.JSONB, allowNull: false },
        summary: { type: DataTypes.JSONB, allowNull: true },
        traceKey: { type: DataTypes.TEXT, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: false },
        proofId: { type: DataTypes.UUID, allowNull: true },
        uploadId: { type: DataTypes.UUID, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'runs', underscored: true },
    );
  }
}
