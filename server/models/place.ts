import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

/** Where a user stopped in a pattern's row stepper. */
export interface PlaceAttributes {
  id: number;
  patternId: number;
  userId: number;
  row: number;
  unit: number;
  updatedAt: Date;
}
export interface PlaceInstance
  extends Model<PlaceAttributes, Optional<PlaceAttributes, 'id' | 'updatedAt'>>, PlaceAttributes {}

export const definePlace = (sequelize: Sequelize) =>
  sequelize.define<PlaceInstance>(
    'Place',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      patternId: { type: DataTypes.INTEGER, allowNull: false },
      userId: { type: DataTypes.INTEGER, allowNull: false },
      row: { type: DataTypes.INTEGER, allowNull: false },
      unit: { type: DataTypes.INTEGER, allowNull: false },
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'places', createdAt: false },
  );
