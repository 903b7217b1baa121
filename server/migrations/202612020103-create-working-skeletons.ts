import type { Migration } from './runner.ts';

// The static part of each working step (title, formula, names, sources, notes without their
// numbers), stored once and referenced from statements' packed workings (see working-codec.ts).
// Rows never change: the id is a hash of the skeleton.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`CREATE TABLE working_skeletons (
    id char(22) PRIMARY KEY,
    skeleton json NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now()
  )`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE working_skeletons');
};
