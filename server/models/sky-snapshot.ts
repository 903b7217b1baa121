import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { SkyTonight } from '@shared/sky/types.ts';

/** The sky tonight for one venue and local date, computed by a job and read by screens and feeds. */
export class SkySnapshot extends Model<InferAttributes<SkySnapshot>, InferCreationAttributes<SkySnapshot>> {
  declare id: CreationOptional<number>;
  declare venueId: string;
  /** "YYYY-MM-DD" in the venue's time zone. */
  declare localDate: string;
  declare computedAt: Date;
  declare data: SkyTonight;

  static initModel(sequelize: Sequelize): void {
    SkySnapshot.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        venueId: { type: DataTypes.UUID, allowNull: false },
        localDate: { type: DataTypes.DATEONLY, allowNull: false },
        computedAt: { type: DataTypes.DATE, allowNull: false },
        data: { type: DataTypes.JSONB, allowNull: false },
      },
      { sequelize, tableName: 'sky_snapshots', modelName: 'skySnapshot', underscored: true, timestamps: false },
    );
  }
}
