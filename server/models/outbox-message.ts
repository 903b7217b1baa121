import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A message caught by the local SMTP catcher. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>;
  declare fromAddress: string;
  declare toAddresses: string;
  declare subject: string;
  declare textBody: string;
  declare receivedAt: Date;

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        fromAddress: { type: DataTypes.TEXT, allowNull: false },
        toAddresses: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'outbox_messages', modelName: 'outboxMessage', underscored: true, timestamps: false },
    );
  }
}
