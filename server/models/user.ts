import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

export type Role = 'admin' | 'designer' | 'tester';
export const ROLES: readonly Role[] = ['admin', 'designer', 'tester'];

export interface UserAttributes {
  id: number;
  name: string;
  email: string;
  role: Role;
  /** Null for an invited tester who has not set a password yet. */
  passwordHash: string | null;
  createdAt: Date;
  updatedAt: Date;
}
export interface UserInstance
  extends
    Model<UserAttributes, Optional<UserAttributes, 'id' | 'passwordHash' | 'createdAt' | 'updatedAt'>>,
    UserAttributes {}

export const defineUser = (sequelize: Sequelize) =>
  sequelize.define<UserInstance>(
    'User',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(200), allowNull: false },
      email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
      role: { type: DataTypes.ENUM(...ROLES), allowNull: false },
      passwordHash: { type: DataTypes.STRING(100), allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'users' },
  );
