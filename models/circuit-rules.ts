import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The rules text of a circuit; `revision` counts its saves so that two writers never overwrite each other. */
export class CircuitRules extends Model<InferAttributes<CircuitRules>, InferCreationAttributes<CircuitRules>> {
  declare circuitId: string;
  declare text: string;
  declare revision: number;
  declare updatedById: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CircuitRules.init(
      {
        circuitId: { type: DataTypes.UUID, primaryKey: true },
        text: { type: DataTypes.TEXT, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        updatedById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'circuit_rules', underscored: true },
    );
  }
}
