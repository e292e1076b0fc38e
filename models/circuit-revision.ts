import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** An immutable snapshot of a circuit document; the database refuses updates. */
export class CircuitRevision extends Model<InferAttributes<CircuitRevision>, InferCreationAttributes<CircuitRevision>> {
  declare id: CreationOptional<string>;
  declare circuitId: string;
  declare number: number;
  declare document: unknown;
  declare authorId: string;
  declare message: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CircuitRevision.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        circuitId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        document: { type: DataTypes.JSONB, allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: false },
        message: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'circuit_revisions', underscored: true, updatedAt: false },
    );
  }
}
