import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

export interface FeedbackAttributes {
  id: number;
  patternId: number;
  /** The version number the note was written on. */
  version: number;
  row: number;
  unit: number | null;
  authorId: number;
  text: string;
  status: 'open' | 'resolved';
  resolvedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}
export interface FeedbackInstance
  extends
    Model<
      FeedbackAttributes,
      Optional<FeedbackAttributes, 'id' | 'unit' | 'status' | 'resolvedAt' | 'createdAt' | 'updatedAt'>
    >,
    FeedbackAttributes {}

export const defineFeedback = (sequelize: Sequelize) =>
  sequelize.define<FeedbackInstance>(
    'Feedback',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      patternId: { type: DataTypes.INTEGER, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false },
      row: { type: DataTypes.INTEGER, allowNull: false },
      unit: { type: DataTypes.INTEGER, allowNull: true },
      authorId: { type: DataTypes.INTEGER, allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      status: { type: DataTypes.ENUM('open', 'resolved'), allowNull: false, defaultValue: 'open' },
      resolvedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'feedback', freezeTableName: true },
  );
