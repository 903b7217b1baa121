import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { LocalisedText, TimelineRelation } from '@shared/statements/index.ts';

/**
 * An event on Earth's timeline that "when the light set out" statements compare a light-travel
 * time with: its date (years ago) ± uncertainty, how it relates ("around the time", "before"), its
 * wording per locale and its published source.
 */
export class TimelineEntry extends Model<InferAttributes<TimelineEntry>, InferCreationAttributes<TimelineEntry>> {
  declare id: CreationOptional<string>;
  declare label: string;
  declare yearsAgo: number;
  declare uncertaintyYears: number;
  declare relation: TimelineRelation;
  declare phrases: LocalisedText;
  declare sourceCitation: string;
  declare sourceUrl: CreationOptional<string | null>;
  declare note: CreationOptional<string | null>;
  declare updatedById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TimelineEntry.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        label: { type: DataTypes.STRING(120), allowNull: false, unique: true },
        yearsAgo: { type: DataTypes.DOUBLE, allowNull: false },
        uncertaintyYears: { type: DataTypes.DOUBLE, allowNull: false },
        relation: { type: DataTypes.STRING(10), allowNull: false },
        phrases: { type: DataTypes.JSONB, allowNull: false },
        sourceCitation: { type: DataTypes.TEXT, allowNull: false },
        sourceUrl: { type: DataTypes.TEXT },
        note: { type: DataTypes.TEXT },
        updatedById: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'timeline_entries', modelName: 'timelineEntry', underscored: true },
    );
  }
}
