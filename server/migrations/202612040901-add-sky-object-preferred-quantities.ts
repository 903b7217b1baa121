import { QUANTITY_IDS } from '../../shared/catalogue/quantities.ts';
import type { Migration } from './runner.ts';

// "Missing a preferred redshift" was an anti-join per object, walking the name index until 50 objects
// without one turned up: at a million objects, 1.8 s when the first names all have one. Each object
// now carries the quantities it has a preferred value for (kept by statement-level triggers, so a CSV
// import of 50,000 rows updates each object once), and every "missing …" filter has a partial index in
// name order holding only the objects it can return.
export const up: Migration['up'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q("ALTER TABLE sky_objects ADD COLUMN preferred_quantities text[] NOT NULL DEFAULT '{}'");
  await q(`UPDATE sky_objects o SET preferred_quantities = p.quantities
           FROM (SELECT object_id, array_agg(DISTINCT quantity::text ORDER BY quantity::text) AS quantities
                 FROM measurements WHERE preferred GROUP BY object_id) p
           WHERE p.object_id = o.id`);
  await q(`CREATE FUNCTION sky_objects_set_preferred_quantities(ids uuid[]) RETURNS void LANGUAGE sql AS $$
    UPDATE sky_objects o
       SET preferred_quantities = fresh.quantities
      FROM (SELECT t.id,
                   coalesce((SELECT array_agg(DISTINCT m.quantity::text ORDER BY m.quantity::text)
                               FROM measurements m WHERE m.object_id = t.id AND m.preferred), '{}') AS quantities
              FROM unnest(ids) AS t(id)) fresh
     WHERE o.id = fresh.id AND o.preferred_quantities IS DISTINCT FROM fresh.quantities
  $$`);
  // Only rows that are (or were) preferred can change an object's list.
  await q(`CREATE FUNCTION sky_objects_refresh_preferred_quantities() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP = 'INSERT' THEN
        PERFORM sky_objects_set_preferred_quantities(ARRAY(SELECT DISTINCT object_id FROM new_rows WHERE preferred));
      ELSIF TG_OP = 'UPDATE' THEN
        PERFORM sky_objects_set_preferred_quantities(ARRAY(
          SELECT object_id FROM new_rows WHERE preferred UNION SELECT object_id FROM old_rows WHERE preferred));
      ELSE
        PERFORM sky_objects_set_preferred_quantities(ARRAY(SELECT DISTINCT object_id FROM old_rows WHERE preferred));
      END IF;
      RETURN NULL;
    END $$`);
  await q(`CREATE TRIGGER measurements_preferred_insert AFTER INSERT ON measurements
           REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sky_objects_refresh_preferred_quantities()`);
  await q(`CREATE TRIGGER measurements_preferred_update AFTER UPDATE ON measurements
           REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION sky_objects_refresh_preferred_quantities()`);
  await q(`CREATE TRIGGER measurements_preferred_delete AFTER DELETE ON measurements
           REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION sky_objects_refresh_preferred_quantities()`);
  // Two per filter: name order, and kind then name order. With one only, PostgreSQL takes the plain
  // name index and filters when a kind is chosen too, which is slow exactly when the first names in
  // order all have the quantity (no statistic tells the planner that).
  const missing: Array<[string, string]> = [
    ...QUANTITY_IDS.map((quantity): [string, string] => [quantity, `NOT (preferred_quantities @> ARRAY['${quantity}']::text[])`]),
    ['any_preferred', "preferred_quantities = '{}'::text[]"],
    ['position', 'ra_deg IS NULL'],
  ];
  for (const [name, predicate] of missing) {
    await q(`CREATE INDEX sky_objects_missing_${name} ON sky_objects (lower(name), id) WHERE ${predicate}`);
    await q(`CREATE INDEX sky_objects_missing_${name}_kind ON sky_objects (kind, lower(name), id) WHERE ${predicate}`);
  }
  // A GIN index keeps new entries in a pending list that every search reads through until vacuum
  // merges it: after a large import a name search took 50 ms instead of 1 ms. Keep that list short.
  await q('ALTER INDEX sky_objects_name_trgm SET (gin_pending_list_limit = 256)');
  await q('ALTER INDEX sky_objects_designations SET (gin_pending_list_limit = 256)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('ALTER INDEX sky_objects_designations RESET (gin_pending_list_limit)');
  await q('ALTER INDEX sky_objects_name_trgm RESET (gin_pending_list_limit)');
  for (const name of [...QUANTITY_IDS, 'any_preferred', 'position']) {
    await q(`DROP INDEX IF EXISTS sky_objects_missing_${name}_kind`);
    await q(`DROP INDEX IF EXISTS sky_objects_missing_${name}`);
  }
  await q('DROP TRIGGER IF EXISTS measurements_preferred_delete ON measurements');
  await q('DROP TRIGGER IF EXISTS measurements_preferred_update ON measurements');
  await q('DROP TRIGGER IF EXISTS measurements_preferred_insert ON measurements');
  await q('DROP FUNCTION IF EXISTS sky_objects_refresh_preferred_quantities()');
  await q('DROP FUNCTION IF EXISTS sky_objects_set_preferred_quantities(uuid[])');
  await q('ALTER TABLE sky_objects DROP COLUMN preferred_quantities');
};
