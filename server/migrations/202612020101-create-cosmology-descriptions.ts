import type { Migration } from './runner.ts';

// Every statement computed under one cosmology carried the same kilobyte of model description
// (parameters and their sources). It is stored once per distinct model and referenced; the id is
// the SHA-256 of the description's jsonb text, so the same model always gets the same row.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(`CREATE TABLE cosmology_descriptions (
    id char(64) PRIMARY KEY,
    label text NOT NULL,
    description jsonb NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now()
  )`);
  await q('ALTER TABLE statements ADD COLUMN model_id char(64) REFERENCES cosmology_descriptions (id) ON DELETE RESTRICT');
  await q(`INSERT INTO cosmology_descriptions (id, label, description)
    SELECT DISTINCT encode(sha256(convert_to(model::text, 'UTF8')), 'hex'), model->>'label', model FROM statements WHERE model IS NOT NULL
    ON CONFLICT (id) DO NOTHING`);
  await q(`UPDATE statements SET model_id = encode(sha256(convert_to(model::text, 'UTF8')), 'hex') WHERE model IS NOT NULL`);
  await q('ALTER TABLE statements DROP COLUMN model');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE statements ADD COLUMN model jsonb');
  await q('ALTER TABLE statements ALTER COLUMN model SET COMPRESSION lz4');
  await q('UPDATE statements s SET model = d.description FROM cosmology_descriptions d WHERE d.id = s.model_id');
  await q('ALTER TABLE statements DROP COLUMN model_id');
  await q('DROP TABLE cosmology_descriptions');
};
