/**
 * Defines every model, then the associations, so no model file needs another.
 */
import type { Sequelize } from 'sequelize';
import { defineAccessToken } from './access-token.js';
import { defineFeedback } from './feedback.js';
import { defineInvitation } from './invitation.js';
import { definePasswordToken } from './password-token.js';
import { definePattern } from './pattern.js';
import { definePlace } from './place.js';
import { defineShareLink } from './share-link.js';
import { defineUser } from './user.js';
import { defineVersion } from './version.js';

export function defineModels(sequelize: Sequelize) {
  const models = {
    User: defineUser(sequelize),
    AccessToken: defineAccessToken(sequelize),
    PasswordToken: definePasswordToken(sequelize),
    Pattern: definePattern(sequelize),
    Version: defineVersion(sequelize),
    ShareLink: defineShareLink(sequelize),
    Invitation: defineInvitation(sequelize),
    Feedback: defineFeedback(sequelize),
    Place: definePlace(sequelize),
  };
  const { User, AccessToken, PasswordToken, Pattern, Version, ShareLink, Invitation, Feedback, Place } = models;
  const cascade = { onDelete: 'CASCADE' as const };
  User.hasMany(AccessToken, { foreignKey: 'userId', ...cascade });
  AccessToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  User.hasMany(PasswordToken, { foreignKey: 'userId', ...cascade });
  PasswordToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  User.hasMany(Pattern, { foreignKey: 'ownerId', ...cascade });
  Pattern.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
  Pattern.hasMany(Version, { foreignKey: 'patternId', ...cascade });
  Version.belongsTo(Pattern, { foreignKey: 'patternId' });
  Version.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Pattern.hasMany(ShareLink, { foreignKey: 'patternId', as: 'shares', ...cascade });
  Pattern.hasMany(Invitation, { foreignKey: 'patternId', as: 'invitations', ...cascade });
  Invitation.belongsTo(User, { foreignKey: 'testerId', as: 'tester' });
  Pattern.hasMany(Feedback, { foreignKey: 'patternId', ...cascade });
  Feedback.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  Pattern.hasMany(Place, { foreignKey: 'patternId', ...cascade });
  return models;
}

export type Models = ReturnType<typeof defineModels>;
