import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

/** `session` tokens come from sign-in; `personal` ones are made for the CLI and listed on the account page. */
export type TokenKind = 'session' | 'personal';

export interface AccessTokenAttributes {
  id: number;
  userId: number;
  kind: TokenKind;
  name: string;
  /** SHA-256 of the token, hex; the token itself is never stored. */
  tokenHash: string;
  lastUsedAt: Date | null;
  expiresAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}
export interface AccessTokenInstance
  extends
    Model<
      AccessTokenAttributes,
      Optional<AccessTokenAttributes, 'id' | 'lastUsedAt' | 'expiresAt' | 'revokedAt' | 'createdAt' | 'updatedAt'>
    >,
    AccessTokenAttributes {}

export const defineAccessToken = (sequelize: Sequelize) =>
  sequelize.define<AccessTokenInstance>(
    'AccessToken',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.ENUM('session', 'personal'), allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      lastUsedAt: { type: DataTypes.DATE, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'access_tokens' },
  );
