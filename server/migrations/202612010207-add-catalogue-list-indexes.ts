import type { Migration } from './runner.ts';

// The catalogue table sorts by name with id as the tie-breaker and pages deep with OFFSET; indexes
// that end in id let PostgreSQL read pages straight off the index. The partial index serves the
// "missing a preferred value" filter, an anti-join on preferred rows only.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('DROP INDEX IF EXISTS sky_objects_kind_lower_name');
  await q('CREATE INDEX sky_objects_kind_name_id ON sky_objects (kind, lower(name), id)');
  await q('CREATE INDEX sky_objects_name_id ON sky_objects (lower(name), id)');
  await q('CREATE INDEX measurements_preferred_object_quantity ON measurements (object_id, quantity) WHERE preferred');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('DROP INDEX IF EXISTS measurements_preferred_object_quantity');
  await q('DROP INDEX IF EXISTS sky_objects_name_id');
  await q('DROP INDEX IF EXISTS sky_objects_kind_name_id');
  await q('CREATE INDEX sky_objects_kind_lower_name ON sky_objects (kind, lower(name))');
};
