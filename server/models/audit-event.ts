import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** An append-only record of who did what; never updated or deleted by the app. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare actorId: string | null;
  declare action: string;
  declare subjectType: string | null;
  declare subjectId: string | null;
  declare data: CreationOptional<Record<string, unknown>>;
  declare ip: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        actorId: { type: DataTypes.UUID },
        action: { type: DataTypes.STRING(60), allowNull: false },
        subjectType: { type: DataTypes.STRING(40) },
        subjectId: { type: DataTypes.STRING(64) },
        data: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        ip: { type: DataTypes.STRING(64) },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', modelName: 'auditEvent', underscored: true, updatedAt: false },
    );
  }
}
