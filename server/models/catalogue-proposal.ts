import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ProposalKind } from '@shared/schemas/catalogue-proposal.ts';
import type { Source } from './source.ts';
import type { User } from './user.ts';

/** An object or source a writer or editor proposed, waiting for a reviewer (or reviewed). */
export class CatalogueProposal extends Model<InferAttributes<CatalogueProposal>, InferCreationAttributes<CatalogueProposal>> {
  declare id: CreationOptional<string>;
  declare kind: ProposalKind;
  declare status: CreationOptional<'proposed' | 'accepted' | 'declined'>;
  /** The object's name or the source's citation. */
  declare title: string;
  /** The parsed fields, as the object or source service takes them. */
  declare proposedValues: Record<string, unknown>;
  /** The source an object proposal cites (null for a source proposal). */
  declare sourceId: string | null;
  declare createdById: string | null;
  declare reviewedById: CreationOptional<string | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare reviewReason: CreationOptional<string | null>;
  /** The object or source created when it was accepted. */
  declare recordId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare source?: NonAttribute<Source | null>;
  declare createdBy?: NonAttribute<User | null>;
  declare reviewedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    CatalogueProposal.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        kind: { type: DataTypes.STRING(8), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'proposed' },
        title: { type: DataTypes.STRING(500), allowNull: false },
        proposedValues: { type: DataTypes.JSONB, allowNull: false },
        sourceId: { type: DataTypes.UUID },
        createdById: { type: DataTypes.UUID },
        reviewedById: { type: DataTypes.UUID },
        reviewedAt: { type: DataTypes.DATE },
        reviewReason: { type: DataTypes.TEXT },
        recordId: { type: DataTypes.UUID },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'catalogue_proposals', modelName: 'catalogueProposal', underscored: true },
    );
  }
}
