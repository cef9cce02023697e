import { DataTypes, type Model, type Optional, type Sequelize } from 'sequelize';

/** A tester's access to one pattern, made by inviting them. */
export interface InvitationAttributes {
  id: number;
  patternId: number;
  testerId: number;
  invitedById: number;
  createdAt: Date;
}
export interface InvitationInstance
  extends Model<InvitationAttributes, Optional<InvitationAttributes, 'id' | 'createdAt'>>, InvitationAttributes {}

export const defineInvitation = (sequelize: Sequelize) =>
  sequelize.define<InvitationInstance>(
    'Invitation',
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      patternId: { type: DataTypes.INTEGER, allowNull: false },
      testerId: { type: DataTypes.INTEGER, allowNull: false },
      invitedById: { type: DataTypes.INTEGER, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'invitations', updatedAt: false },
  );
