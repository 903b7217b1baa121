import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    password_hash: { type: DataTypes.STRING(100) },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    failed_sign_ins: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    throttled_until: { type: DataTypes.DATE },
    last_sign_in_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(
    "ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('admin','editor','reviewer','writer'))",
  );
  await qi.sequelize.query('ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email))');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('users');
};
