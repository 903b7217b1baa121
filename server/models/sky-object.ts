import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { SkyObjectKind } from '@shared/catalogue/kinds.ts';
import type { SentenceNames } from '@shared/statements/names.ts';

/** An object in the sky: a star, galaxy, planet… with its J2000 position (none for solar-system bodies). */
export class SkyObject extends Model<InferAttributes<SkyObject>, InferCreationAttributes<SkyObject>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare designations: CreationOptional<string[]>;
  declare kind: SkyObjectKind;
  declare raDeg: number | null;
  declare decDeg: number | null;
  /** IAU abbreviation computed from the position (Roman 1987); never typed in. */
  declare constellation: string | null;
  declare notes: CreationOptional<string>;
  /** The name as sentences use it, per language (article, singular or plural); {} → the name as listed. */
  declare sentenceNames: CreationOptional<SentenceNames>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SkyObject.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
        designations: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        raDeg: { type: DataTypes.DOUBLE },
        decDeg: { type: DataTypes.DOUBLE },
        constellation: { type: DataTypes.STRING(3) },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        sentenceNames: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sky_objects', modelName: 'skyObject', underscored: true },
    );
  }
}
