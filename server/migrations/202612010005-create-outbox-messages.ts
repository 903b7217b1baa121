import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

// Mail caught by the local SMTP catcher (development and tests); empty when a real relay is used.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    from_address: { type: DataTypes.TEXT, allowNull: false },
    to_addresses: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('outbox_messages', ['received_at']);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('outbox_messages');
};
