import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Where a comment is pinned: the circuit, a component, a tube, or a moment of a saved run. */
export type CommentAnchor =
  | { kind: 'circuit' }
  | { kind: 'component'; componentId: string }
  | { kind: 'tube'; tubeId: string }
  | { kind: 'run'; runId: string; timeS: number };

export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>;
  declare circuitId: string;
  declare revisionId: string | null;
  declare parentId: string | null;
  declare authorId: string;
  declare anchor: CommentAnchor;
  /** Plain text; rendered as text, never as HTML. */
  declare body: string;
  declare resolvedAt: Date | null;
  declare resolvedById: string | null;
  /** When the author last changed the body; null while it is as first written. */
  declare editedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Comment.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        circuitId: { type: DataTypes.UUID, allowNull: false },
        revisionId: { type: DataTypes.UUID, allowNull: true },
        parentId: { type: DataTypes.UUID, allowNull: true },
        authorId: { type: DataTypes.UUID, allowNull: false },
        anchor: { type: DataTypes.JSONB, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        resolvedById: { type: DataTypes.UUID, allowNull: true },
        editedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'comments', underscored: true },
    );
  }
}
