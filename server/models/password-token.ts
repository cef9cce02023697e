import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

/** A single-use link for a password reset or an invited tester's first password. */
export interface PasswordTokenAttributes {
  id: number;
  userId: number;
  purpose: 'reset' | 'invite';
  tokenHash: string;
  expiresAt: Date;
  usedAt: Date | null;
  createdAt: Date;
}
export interface PasswordTokenInstance
  extends
    Model<PasswordTokenAttributes, Optional<PasswordTokenAttributes, 'id' | 'usedAt' | 'createdAt'>>,
    PasswordTokenAttributes {}

export const definePasswordToken = (sequelize: Sequelize) =>
  sequelize.define<PasswordTokenInstance>(
    'PasswordToken',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      purpose: { type: DataTypes.ENUM('reset', 'invite'), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'password_tokens', updatedAt: false },
  );
