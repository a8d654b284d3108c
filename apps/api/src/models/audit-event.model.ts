import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type AuditArea =
  'auth' | 'admin' | 'moderation' | 'treasury' | 'payments' | 'exchange' | 'storm';

/** Append-only log of who did what, when and why. Never updated or deleted. */
export class AuditEvent extends Model<
  InferAttributes<AuditEvent>,
  InferCreationAttributes<AuditEvent>
> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare area: AuditArea;
  declare action: string;
  declare subjectType: string;
  declare subjectId: string | null;
  declare reason: string | null;
  declare details: unknown;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditEvent(sequelize: Sequelize) {
  AuditEvent.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      area: { type: DataTypes.STRING(20), allowNull: false },
      action: { type: DataTypes.STRING(60), allowNull: false },
      subjectType: { type: DataTypes.STRING(40), allowNull: false },
      subjectId: { type: DataTypes.STRING(64), allowNull: true },
      reason: { type: DataTypes.STRING(1000), allowNull: true },
      details: { type: DataTypes.JSON, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
  );
}
