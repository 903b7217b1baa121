import type { Migration } from './runner.ts';

// The working is a document to show, never searched inside: stored as json text (PostgreSQL checks
// the syntax and keeps the text, lz4-compressed) it costs far less to rewrite on every recompute
// than jsonb, which builds a binary tree of every key. New workings are packed (see working-codec.ts);
// older plain step arrays stay readable as they are.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE statements ALTER COLUMN working DROP DEFAULT;
    ALTER TABLE statements ALTER COLUMN working TYPE json USING working::json;
    ALTER TABLE statements ALTER COLUMN working SET DEFAULT '[]'::json;
  `);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  // Packed workings go back as they are (the codec reads both forms).
  await qi.sequelize.query(`
    ALTER TABLE statements ALTER COLUMN working DROP DEFAULT;
    ALTER TABLE statements ALTER COLUMN working TYPE jsonb USING working::jsonb;
    ALTER TABLE statements ALTER COLUMN working SET DEFAULT '[]'::jsonb;
  `);
};
