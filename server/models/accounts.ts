/** Users, their sessions and the single-use tokens of e-mailed links. */
import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { ROLES, type Role } from '../../shared/schemas/auth';
import type { UserDto } from '../../shared/api-types';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  /** Lower-case; unique. */
  declare email: string;
  declare displayName: string;
  /** argon2id, PHC string format. Never leaves the server. */
  declare passwordHash: string;
  declare role: CreationOptional<Role>;
  declare emailVerifiedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  toDto(): UserDto {
    return {
      id: this.id,
      email: this.email,
      displayName: this.displayName,
      role: this.role,
      verified: this.emailVerifiedAt !== null,
      createdAt: this.createdAt.toISOString(),
    };
  }
}

/** A row of the express-session store (connect-session-sequelize finds it as the model "Session"). */
export class Session extends Model<InferAttributes<Session>, InferCreationAttributes<Session>> {
  declare sid: string;
  declare expires: Date | null;
  declare data: string | null;
  /** The signed-in user, kept beside the session data so that one user's sessions can be ended. */
  declare userId: ForeignKey<number> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export const TOKEN_PURPOSES = ['verify', 'reset'] as const;
export type TokenPurpose = (typeof TOKEN_PURPOSES)[number];

export class EmailToken extends Model<InferAttributes<EmailToken>, InferCreationAttributes<EmailToken>> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<number>;
  declare purpose: TokenPurpose;
  /** SHA-256 of the token, hex. */
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

export function initAccounts(sequelize: Sequelize): void {
  User.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      displayName: { type: DataTypes.STRING(80), allowNull: false },
      passwordHash: { type: DataTypes.STRING(255), allowNull: false },
      role: { type: DataTypes.ENUM(...ROLES), allowNull: false, defaultValue: 'contributor' },
      emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'users', modelName: 'User' },
  );
  Session.init(
    {
      sid: { type: DataTypes.STRING(128), primaryKey: true },
      expires: { type: DataTypes.DATE, allowNull: true },
      data: { type: DataTypes.TEXT, allowNull: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'sessions', modelName: 'Session' },
  );
  EmailToken.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      purpose: { type: DataTypes.ENUM(...TOKEN_PURPOSES), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'email_tokens', modelName: 'EmailToken', updatedAt: false },
  );
  EmailToken.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  Session.belongsTo(User, { as: 'user', foreignKey: 'userId' });
}
