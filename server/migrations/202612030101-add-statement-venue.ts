import type { Migration } from './runner.ts';

const NO_VENUE = "'00000000-0000-0000-0000-000000000000'::uuid";

// A statement about a venue's sky is for one venue: (object, template, venue) is unique, and a
// statement with no venue counts as one more value, so there is still one per object and template.
// A venue that statements are for cannot be deleted (RESTRICT; the service refuses in words first).
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE statements ADD COLUMN venue_id uuid REFERENCES venues (id) ON DELETE RESTRICT;
    DROP INDEX statements_object_template;
    CREATE UNIQUE INDEX statements_object_template_venue ON statements (sky_object_id, template_id, COALESCE(venue_id, ${NO_VENUE}));
    CREATE INDEX statements_venue ON statements (venue_id) WHERE venue_id IS NOT NULL;
  `);
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const [rows] = await qi.sequelize.query('SELECT count(*)::int AS n FROM statements WHERE venue_id IS NOT NULL');
  const n = (rows as Array<{ n: number }>)[0].n;
  // Without the column these statements would lose what they are about; refuse rather than guess.
  if (n > 0)
    throw new Error(`${n} statement${n === 1 ? ' is' : 's are'} for a venue; remove them before undoing this migration.`);
  await qi.sequelize.query(`
    DROP INDEX statements_venue;
    DROP INDEX statements_object_template_venue;
    ALTER TABLE statements DROP COLUMN venue_id;
    CREATE UNIQUE INDEX statements_object_template ON statements (sky_object_id, template_id);
  `);
};
