import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { JOB_STATUSES, type JobStatus } from './job-status';


/** A search for the faults that best explain one field log on one revision, worked by a job worker. */
export class FaultSearch extends Model<InferAttributes<FaultSearch>, InferCreationAttributes<FaultSearch>> {
  declare id: CreationOptional<string>;
  declare uploadId: string;
  declare revisionId: string;
  /** The column mapping as it was when the search started. */
  declare mapping: unknown;
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
    FaultSearch.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        uploadId: { type: DataTypes.UUID, allowNull: false },
        revisionId: { type: DataTypes.UUID, allowNull: false },
        mapping: { type: DataTypes.JSONB, allowNull: false },
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
      { sequelize, tableName: 'fault_searches', underscored: true },
    );
  }
}
