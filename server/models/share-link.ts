import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

export interface ShareLinkAttributes {
  id: number;
  patternId: number;
  createdById: number;
  tokenHash: string;
  expiresAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}
export interface ShareLinkInstance
  extends
    Model<ShareLinkAttributes, Optional<ShareLinkAttributes, 'id' | 'expiresAt' | 'revokedAt' | 'createdAt'>>,
    ShareLinkAttributes {}

export const defineShareLink = (sequelize: Sequelize) =>
  sequelize.define<ShareLinkInstance>(
    'ShareLink',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      patternId: { type: DataTypes.INTEGER, allowNull: false },
      createdById: { type: DataTypes.INTEGER, allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'share_links', updatedAt: false },
  );
