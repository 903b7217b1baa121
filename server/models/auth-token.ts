import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type TokenPurpose = 'invitation' | 'password_reset';

/** A single-use, expiring e-mailed token; only its SHA-256 hash is stored. */
export class AuthToken extends Model<InferAttributes<AuthToken>, InferCreationAttributes<AuthToken>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare purpose: TokenPurpose;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuthToken.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        userId: { type: DataTypes.UUID, allowNull: false },
        purpose: { type: DataTypes.STRING(20), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'auth_tokens', modelName: 'authToken', underscored: true, updatedAt: false },
    );
  }
}
