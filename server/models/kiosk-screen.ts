import type { ReportedOrientation, ScreenOrientation } from '@shared/schemas/kiosk.ts';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A kiosk display in a venue. Pairs once with a short code; then acts with a long token stored as a SHA-256 hash. */
export class KioskScreen extends Model<InferAttributes<KioskScreen>, InferCreationAttributes<KioskScreen>> {
  declare id: CreationOptional<string>;
  declare venueId: string;
  declare name: string;
  declare pairingCodeHash: CreationOptional<string | null>;
  /** Set while a pairing code is waiting; cleared when the code is used. */
  declare pairingExpiresAt: CreationOptional<Date | null>;
  declare tokenHash: CreationOptional<string | null>;
  declare tokenIssuedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare lastSeenAt: CreationOptional<Date | null>;
  declare playerVersion: CreationOptional<string | null>;
  declare showing: CreationOptional<Record<string, unknown> | null>;
  /** The one language this screen plays (a locale tag), or null to alternate between its channel's. */
  declare language: CreationOptional<string | null>;
  /** How the screen hangs, as an admin set it: auto lets the player's viewport decide. */
  declare orientation: CreationOptional<ScreenOrientation>;
  /** The slide on screen at the last heartbeat (null: the holding screen), and its title. */
  declare showingSlideId: CreationOptional<string | null>;
  declare showingSlideTitle: CreationOptional<string | null>;
  /** The orientation the player reported laying slides out in. */
  declare reportedOrientation: CreationOptional<ReportedOrientation | null>;
  /** When admins were e-mailed that the screen went silent; cleared by its next heartbeat. */
  declare silenceAlertedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    KioskScreen.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        venueId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        pairingCodeHash: { type: DataTypes.STRING(64) },
        pairingExpiresAt: { type: DataTypes.DATE },
        tokenHash: { type: DataTypes.STRING(64) },
        tokenIssuedAt: { type: DataTypes.DATE },
        revokedAt: { type: DataTypes.DATE },
        lastSeenAt: { type: DataTypes.DATE },
        playerVersion: { type: DataTypes.STRING(40) },
        showing: { type: DataTypes.JSONB },
        language: { type: DataTypes.STRING(10) },
        orientation: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'auto' },
        showingSlideId: { type: DataTypes.UUID },
        showingSlideTitle: { type: DataTypes.STRING(200) },
        reportedOrientation: { type: DataTypes.STRING(10) },
        silenceAlertedAt: { type: DataTypes.DATE },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'kiosk_screens', modelName: 'kioskScreen', underscored: true },
    );
  }
}
