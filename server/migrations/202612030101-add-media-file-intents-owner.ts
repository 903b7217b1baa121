import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

/** Which server process wrote a journal note, so a restart settles a crashed server's notes at once. */
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.addColumn('media_file_intents', 'owner', { type: DataTypes.STRING(200), allowNull: true });
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.removeColumn('media_file_intents', 'owner');
};
