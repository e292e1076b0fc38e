import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Append-only record of security-relevant actions (sign-in, role change, approvals ...). */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string | null;
  declare actorId: string | null;
  /** Dotted verb such as `circuit.created` or `auth.sign_in_failed`. */
  declare action: string;
  declare targetType: string | null;
  declare targetId: string | null;
  declare data: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: true },
        actorId: { type: DataTypes.UUID, allowNull: true },
        action: { type: DataTypes.TEXT, allowNull: false },
        targetType: { type: DataTypes.TEXT, allowNull: true },
        targetId: { type: DataTypes.TEXT, allowNull: true },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
    );
  }
}
