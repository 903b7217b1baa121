import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

/** Whether a person wants one morning e-mail of the pages waiting for them. */
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.addColumn('users', 'page_digest', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.removeColumn('users', 'page_digest');
};
