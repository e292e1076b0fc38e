import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Circuit extends Model<InferAttributes<Circuit>, InferCreationAttributes<Circuit>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare title: string;
  declare description: CreationOptional<string>;
  declare currentRevisionId: string | null;
  /** Number of the newest revision; equals the revision count since revisions are append-only. */
  declare currentRevisionNumber: CreationOptional<number>;
  /** Bumped on every write; a writer that read an older value gets a conflict. */
  declare lockVersion: CreationOptional<number>;
  declare createdById: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Circuit.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        title: { type: DataTypes.TEXT, allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        currentRevisionId: { type: DataTypes.UUID, allowNull: true },
        currentRevisionNumber: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lockVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdById: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'circuits', underscored: true },
    );
  }
}
