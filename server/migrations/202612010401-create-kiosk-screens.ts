import { DataTypes } from 'sequelize';
import type { Migration } from './runner.ts';

export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.createTable('kiosk_screens', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    venue_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'venues', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    // SHA-256 of the short pairing code; kept after use (with pairing_expires_at cleared) so a reused code can be told apart from a mistyped one.
    pairing_code_hash: { type: DataTypes.STRING(64) },
    pairing_expires_at: { type: DataTypes.DATE },
    token_hash: { type: DataTypes.STRING(64) },
    token_issued_at: { type: DataTypes.DATE },
    revoked_at: { type: DataTypes.DATE },
    last_seen_at: { type: DataTypes.DATE },
    player_version: { type: DataTypes.STRING(40) },
    showing: { type: DataTypes.JSONB },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(
    'CREATE UNIQUE INDEX kiosk_screens_pairing_code_hash ON kiosk_screens (pairing_code_hash) WHERE pairing_code_hash IS NOT NULL',
  );
  await q('CREATE UNIQUE INDEX kiosk_screens_token_hash ON kiosk_screens (token_hash) WHERE token_hash IS NOT NULL');
  await q('CREATE UNIQUE INDEX kiosk_screens_venue_lower_name ON kiosk_screens (venue_id, lower(name))');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.dropTable('kiosk_screens');
};
