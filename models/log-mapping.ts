import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A saved column mapping of a circuit's field logs; `revision` counts saves, for optimistic concurrency. */
export class LogMapping extends Model<InferAttributes<LogMapping>, InferCreationAttributes<LogMapping>> {
  declare id: CreationOptional<string>;
  declare circuitId: string;
  /** The upload it was saved for; null once that upload is deleted (the mapping stays reusable). */
  declare uploadId: string | null;
  declare name: string;
  declare mapping: unknown;
  /** Hex SHA-256 of the log's column names in order: logs with the same columns can reuse the mapping. */
  declare columnsSignature: string;
  declare revision: CreationOptional<number>;
  declare updatedById: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    LogMapping.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        circuitId: { type: DataTypes.UUID, allowNull: false },
        uploadId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        mapping: { type: DataTypes.JSONB, allowNull: false },
        columnsSignature: { type: DataTypes.CHAR(64), allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        updatedById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'log_mappings', underscored: true },
    );
  }
}
