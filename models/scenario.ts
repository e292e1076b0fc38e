import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Timed inputs of a circuit with what must be seen, written as rules; `revision` counts its saves. */
export class Scenario extends Model<InferAttributes<Scenario>, InferCreationAttributes<Scenario>> {
  declare id: CreationOptional<string>;
  declare circuitId: string;
  declare name: string;
  /** Timed inputs as engine/solver/inputs.ts reads them. */
  declare inputs: unknown;
  declare untilS: number;
  /** Rules text checked against the scenario's trace. */
  declare expectations: string;
  declare revision: CreationOptional<number>;
  declare createdById: string;
  declare updatedById: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Scenario.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        circuitId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        inputs: { type: DataTypes.JSONB, allowNull: false },
        untilS: { type: DataTypes.DOUBLE, allowNull: false },
        expectations: { type: DataTypes.TEXT, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdById: { type: DataTypes.UUID, allowNull: false },
        updatedById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'scenarios', underscored: true },
    );
  }
}
