import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A file kept in object storage (field logs); the row holds what is needed to trust and list it. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare circuitId: string | null;
  declare uploadedById: string;
  declare fileName: string;
  declare contentType: string;
  declare sizeBytes: number;
  /** Hex SHA-256 of the stored bytes. */
  declare sha256: string;
  declare storageKey: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Upload.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        circuitId: { type: DataTypes.UUID, allowNull: true },
        uploadedById: { type: DataTypes.UUID, allowNull: false },
        fileName: { type: DataTypes.TEXT, allowNull: false },
        contentType: { type: DataTypes.TEXT, allowNull: false },
        sizeBytes: { type: DataTypes.BIGINT, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        storageKey: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'uploads', underscored: true, updatedAt: false },
    );
  }
}
