import type { Migration } from './runner.ts';

// Which statements use which measurement and source, as rows: a catalogue edit finds the statements
// to recompute by a plain index lookup. It replaces the GIN index on statements.inputs, which every
// rewrite of a statement had to update even when its inputs had not moved. With room left on each
// page (fillfactor), a recompute that changes neither status nor inputs rewrites a statement in place.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(`CREATE TABLE statement_inputs (
    statement_id uuid NOT NULL REFERENCES statements (id) ON DELETE CASCADE,
    measurement_id uuid NOT NULL,
    source_id uuid NOT NULL,
    PRIMARY KEY (statement_id, measurement_id)
  )`);
  await q('CREATE INDEX statement_inputs_measurement ON statement_inputs (measurement_id)');
  await q('CREATE INDEX statement_inputs_source ON statement_inputs (source_id)');
  await q(`INSERT INTO statement_inputs (statement_id, measurement_id, source_id)
    SELECT s.id, (i->>'measurementId')::uuid, (i->>'sourceId')::uuid FROM statements s, jsonb_array_elements(s.inputs) i
    ON CONFLICT DO NOTHING`);
  await q('DROP INDEX statements_inputs');
  await q('ALTER TABLE statements SET (fillfactor = 80)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER TABLE statements RESET (fillfactor)');
  await q('CREATE INDEX statements_inputs ON statements USING gin (inputs jsonb_path_ops)');
  await q('DROP TABLE statement_inputs');
};
