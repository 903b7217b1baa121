import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

/** The kinds an object may have; kept in step with SKY_OBJECT_KINDS in shared/catalogue/kinds.ts. */
const KINDS = ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'planet', 'moon', 'sun', 'other'];

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('sky_objects', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
    designations: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    ra_deg: { type: DataTypes.DOUBLE },
    dec_deg: { type: DataTypes.DOUBLE },
    constellation: { type: DataTypes.STRING(3) },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    `ALTER TABLE sky_objects ADD CONSTRAINT sky_objects_kind_check CHECK (kind IN (${KINDS.map((k) => `'${k}'`).join(',')}))`,
  );
  await q('ALTER TABLE sky_objects ADD CONSTRAINT sky_objects_ra_range CHECK (ra_deg IS NULL OR (ra_deg >= 0 AND ra_deg < 360))');
  await q(
    'ALTER TABLE sky_objects ADD CONSTRAINT sky_objects_dec_range CHECK (dec_deg IS NULL OR (dec_deg >= -90 AND dec_deg <= 90))',
  );
  // A position is both coordinates or neither (solar-system bodies have none fixed).
  await q('ALTER TABLE sky_objects ADD CONSTRAINT sky_objects_position_pair CHECK ((ra_deg IS NULL) = (dec_deg IS NULL))');
  // Case-insensitive lookups by name (CSV import matches names this way) and a lower(name) sort for the table.
  await q('CREATE UNIQUE INDEX sky_objects_lower_name ON sky_objects (lower(name))');
  await q('CREATE INDEX sky_objects_kind_lower_name ON sky_objects (kind, lower(name))');
  await q('CREATE INDEX sky_objects_designations ON sky_objects USING gin (designations)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('sky_objects');
};
