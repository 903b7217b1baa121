import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('channel_slides', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    channel_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'channels', key: 'id' }, onDelete: 'CASCADE' },
    position: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    // A deleted page takes its slides with it; an image in use cannot be deleted (RESTRICT).
    page_id: { type: DataTypes.UUID, references: { model: 'pages', key: 'id' }, onDelete: 'CASCADE' },
    statement_ids: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
    media_id: { type: DataTypes.UUID, references: { model: 'media', key: 'id' }, onDelete: 'RESTRICT' },
    caption: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    duration_s: { type: DataTypes.SMALLINT, allowNull: false, defaultValue: 12 },
    starts_at: { type: DataTypes.DATE },
    ends_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q("ALTER TABLE channel_slides ADD CONSTRAINT channel_slides_kind CHECK (kind IN ('page', 'image', 'sky_tonight'))");
  await q(`ALTER TABLE channel_slides ADD CONSTRAINT channel_slides_kind_fields CHECK (
    (kind = 'page' AND page_id IS NOT NULL) OR (kind = 'image' AND media_id IS NOT NULL AND page_id IS NULL) OR (kind = 'sky_tonight' AND page_id IS NULL AND media_id IS NULL))`);
  await q('ALTER TABLE channel_slides ADD CONSTRAINT channel_slides_duration CHECK (duration_s BETWEEN 5 AND 120)');
  await q(
    'ALTER TABLE channel_slides ADD CONSTRAINT channel_slides_window CHECK (starts_at IS NULL OR ends_at IS NULL OR ends_at > starts_at)',
  );
  // Deferred so a reorder can swap positions inside one transaction.
  await q(
    'ALTER TABLE channel_slides ADD CONSTRAINT channel_slides_position UNIQUE (channel_id, position) DEFERRABLE INITIALLY DEFERRED',
  );
  await q('CREATE INDEX channel_slides_page ON channel_slides (page_id) WHERE page_id IS NOT NULL');
  await q('CREATE INDEX channel_slides_media ON channel_slides (media_id) WHERE media_id IS NOT NULL');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('channel_slides');
};
