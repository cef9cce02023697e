import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

export interface PatternColor {
  key: string;
  hex: string;
  name: string;
}

/** Counts and colours are copied from the current version so the library lists without reading sources. */
export interface PatternAttributes {
  id: number;
  ownerId: number;
  title: string;
  layout: string;
  rows: number;
  units: number | null;
  beads: number | null;
  colors: PatternColor[];
  currentVersion: number;
  errors: number;
  warnings: number;
  createdAt: Date;
  updatedAt: Date;
}
export interface PatternInstance
  extends Model<PatternAttributes, Optional<PatternAttributes, 'id' | 'createdAt' | 'updatedAt'>>, PatternAttributes {}

export const definePattern = (sequelize: Sequelize) =>
  sequelize.define<PatternInstance>(
    'Pattern',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING(300), allowNull: false },
      layout: { type: DataTypes.STRING(10), allowNull: false },
      rows: { type: DataTypes.INTEGER, allowNull: false },
      units: { type: DataTypes.INTEGER, allowNull: true },
      beads: { type: DataTypes.INTEGER, allowNull: true },
      colors: { type: DataTypes.JSON, allowNull: false },
      currentVersion: { type: DataTypes.INTEGER, allowNull: false },
      errors: { type: DataTypes.INTEGER, allowNull: false },
      warnings: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'patterns' },
  );
