import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';
import type { Diagnostic } from '../../shared/diagnostic.js';

export interface VersionAttributes {
  id: number;
  patternId: number;
  number: number;
  authorId: number;
  source: string;
  /** The `fourfold.model/1` JSON text, or null when the engine could not run. */
  model: string | null;
  diagnostics: Diagnostic[];
  /** SHA-256 of the source, hex: an identical re-upload makes no new version. */
  contentHash: string;
  createdAt: Date;
}
export interface VersionInstance
  extends Model<VersionAttributes, Optional<VersionAttributes, 'id' | 'model' | 'createdAt'>>, VersionAttributes {}

export const defineVersion = (sequelize: Sequelize) =>
  sequelize.define<VersionInstance>(
    'Version',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      patternId: { type: DataTypes.INTEGER, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      source: { type: DataTypes.TEXT('medium'), allowNull: false },
      model: { type: DataTypes.TEXT('long'), allowNull: true },
      diagnostics: { type: DataTypes.JSON, allowNull: false },
      contentHash: { type: DataTypes.CHAR(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'versions', updatedAt: false },
  );
