import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('measurements', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    object_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'sky_objects', key: 'id' }, onDelete: 'RESTRICT' },
    quantity: { type: DataTypes.STRING(32), allowNull: false },
    band: { type: DataTypes.STRING(16) },
    value: { type: DataTypes.DOUBLE, allowNull: false },
    uncertainty: { type: DataTypes.DOUBLE },
    uncertainty_minus: { type: DataTypes.DOUBLE },
    uncertainty_plus: { type: DataTypes.DOUBLE },
    entered_value: { type: DataTypes.DOUBLE, allowNull: false },
    entered_unit: { type: DataTypes.STRING(16), allowNull: false, defaultValue: '' },
    source_id: { type: DataTypes.UUID, references: { model: 'sources', key: 'id' }, onDelete: 'RESTRICT' },
    preferred: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'accepted' },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    created_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewed_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewed_at: { type: DataTypes.DATE },
    review_reason: { type: DataTypes.TEXT },
    retired_by_id: { type: DataTypes.UUID, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    retired_at: { type: DataTypes.DATE },
    retire_reason: { type: DataTypes.TEXT },
    import_id: { type: DataTypes.UUID },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    "ALTER TABLE measurements ADD CONSTRAINT measurements_status_check CHECK (status IN ('proposed','accepted','declined'))",
  );
  await q(
    'ALTER TABLE measurements ADD CONSTRAINT measurements_uncertainty_check CHECK ((uncertainty IS NULL OR uncertainty >= 0) AND (uncertainty_minus IS NULL OR uncertainty_minus >= 0) AND (uncertainty_plus IS NULL OR uncertainty_plus >= 0))',
  );
  // Symmetric or asymmetric, never both; asymmetric needs both sides.
  await q(
    'ALTER TABLE measurements ADD CONSTRAINT measurements_uncertainty_shape CHECK ((uncertainty_minus IS NULL) = (uncertainty_plus IS NULL) AND (uncertainty IS NULL OR uncertainty_minus IS NULL))',
  );
  // Statements rest on preferred values: only an accepted, current, sourced measurement may be one.
  await q(
    "ALTER TABLE measurements ADD CONSTRAINT measurements_preferred_needs_source CHECK (NOT preferred OR (source_id IS NOT NULL AND status = 'accepted' AND retired_at IS NULL))",
  );
  // One preferred value per object, quantity and band, held by the database itself.
  await q(
    "CREATE UNIQUE INDEX measurements_one_preferred ON measurements (object_id, quantity, coalesce(band, '')) WHERE preferred",
  );
  await q('CREATE INDEX measurements_object_quantity ON measurements (object_id, quantity)');
  await q('CREATE INDEX measurements_source ON measurements (source_id)');
  await q("CREATE INDEX measurements_proposed ON measurements (created_at) WHERE status = 'proposed'");
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('measurements');
};
