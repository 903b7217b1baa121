import type { Migration } from './runner.ts';

// The list of locales lives in one place, shared/statements/locales.ts (checked by every schema that
// takes one); the database keeps only the shape of a BCP 47 language-region tag, so adding a locale
// needs no migration.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages DROP CONSTRAINT pages_locale_check');
  await q("ALTER TABLE pages ADD CONSTRAINT pages_locale_check CHECK (locale ~ '^[a-z]{2,3}-[A-Z]{2}$')");
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE pages DROP CONSTRAINT pages_locale_check');
  await q("ALTER TABLE pages ADD CONSTRAINT pages_locale_check CHECK (locale IN ('en-GB','en-US','fr-FR'))");
};
