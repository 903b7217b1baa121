import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { Role } from '@shared/roles.ts';

/** A member of staff. Has no password until an invitation is accepted. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: CreationOptional<string | null>;
  declare active: CreationOptional<boolean>;
  declare failedSignIns: CreationOptional<number>;
  declare throttledUntil: CreationOptional<Date | null>;
  declare lastSignInAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100) },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        failedSignIns: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        throttledUntil: { type: DataTypes.DATE },
        lastSignInAt: { type: DataTypes.DATE },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', modelName: 'user', underscored: true },
    );
  }
}
