import type { Migration } from './runner.ts';

// An object's name as a sentence uses it, per language: { en: { text, plural }, fr: { text, plural } }
// ("the Pleiades", plural). Empty means "the catalogue name, singular, no article".
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE sky_objects ADD COLUMN sentence_names jsonb NOT NULL DEFAULT '{}'::jsonb`);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('ALTER TABLE sky_objects DROP COLUMN sentence_names');
};
