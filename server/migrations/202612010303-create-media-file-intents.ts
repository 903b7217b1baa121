import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

/**
 * A journal of stored files whose fate is not settled yet (an upload or re-render in progress, a
 * delete whose files are being removed). The start-up sweep settles what a crash left here, and
 * only that: it never lists the storage, so it cannot touch files another database owns.
 */
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('media_file_intents', {
    storage_key: { type: DataTypes.STRING(200), primaryKey: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('media_file_intents');
};
