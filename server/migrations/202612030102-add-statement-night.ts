import type { Migration } from './runner.ts';

// What a statement that follows tonight was computed for (venue position, night, constants,
// ephemeris, sentence): the status rule compares it to tell a new night from a new method.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE statements ADD COLUMN night jsonb');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE statements DROP COLUMN night');
};
