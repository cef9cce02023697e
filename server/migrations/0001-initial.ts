/** The first schema: accounts, tokens, patterns with their versions, sharing, feedback, places. */
import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true, allowNull: false };
const at = (allowNull = false) => ({ type: DataTypes.DATE, allowNull });
const ref = (table: string) => ({
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete: 'CASCADE',
});

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id,
    name: { type: DataTypes.STRING(200), allowNull: false },
    email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
    role: { type: DataTypes.ENUM('admin', 'designer', 'tester'), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: true },
    createdAt: at(),
    updatedAt: at(),
  });
  await qi.createTable('access_tokens', {
    id,
    userId: ref('users'),
    kind: { type: DataTypes.ENUM('session', 'personal'), allowNull: false },
    name: { type: DataTypes.STRING(200), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    lastUsedAt: at(true),
    expiresAt: at(true),
    revokedAt: at(true),
    createdAt: at(),
    updatedAt: at(),
  });
  await qi.createTable('password_tokens', {
    id,
    userId: ref('users'),
    purpose: { type: DataTypes.ENUM('reset', 'invite'), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expiresAt: at(),
    usedAt: at(true),
    createdAt: at(),
  });
  await qi.createTable('patterns', {
    id,
    ownerId: ref('users'),
    title: { type: DataTypes.STRING(300), allowNull: false },
    layout: { type: DataTypes.STRING(10), allowNull: false },
    rows: { type: DataTypes.INTEGER, allowNull: false },
    units: { type: DataTypes.INTEGER, allowNull: true },
    beads: { type: DataTypes.INTEGER, allowNull: true },
    colors: { type: DataTypes.JSON, allowNull: false },
    currentVersion: { type: DataTypes.INTEGER, allowNull: false },
    errors: { type: DataTypes.INTEGER, allowNull: false },
    warnings: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: at(),
    updatedAt: at(),
  });
  await qi.addIndex('patterns', ['ownerId', 'updatedAt']);
  await qi.addIndex('patterns', ['title']);
  await qi.createTable('versions', {
    id,
    patternId: ref('patterns'),
    number: { type: DataTypes.INTEGER, allowNull: false },
    authorId: ref('users'),
    source: { type: DataTypes.TEXT('medium'), allowNull: false },
    model: { type: DataTypes.TEXT('long'), allowNull: true },
    diagnostics: { type: DataTypes.JSON, allowNull: false },
    contentHash: { type: DataTypes.CHAR(64), allowNull: false },
    createdAt: at(),
  });
  await qi.addIndex('versions', ['patternId', 'number'], { unique: true });
  await qi.createTable('share_links', {
    id,
    patternId: ref('patterns'),
    createdById: ref('users'),
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expiresAt: at(true),
    revokedAt: at(true),
    createdAt: at(),
  });
  await qi.createTable('invitations', {
    id,
    patternId: ref('patterns'),
    testerId: ref('users'),
    invitedById: ref('users'),
    createdAt: at(),
  });
  await qi.addIndex('invitations', ['patternId', 'testerId'], { unique: true });
  await qi.createTable('feedback', {
    id,
    patternId: ref('patterns'),
    version: { type: DataTypes.INTEGER, allowNull: false },
    row: { type: DataTypes.INTEGER, allowNull: false },
    unit: { type: DataTypes.INTEGER, allowNull: true },
    authorId: ref('users'),
    text: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.ENUM('open', 'resolved'), allowNull: false, defaultValue: 'open' },
    resolvedAt: at(true),
    createdAt: at(),
    updatedAt: at(),
  });
  await qi.createTable('places', {
    id,
    patternId: ref('patterns'),
    userId: ref('users'),
    row: { type: DataTypes.INTEGER, allowNull: false },
    unit: { type: DataTypes.INTEGER, allowNull: false },
    updatedAt: at(),
  });
  await qi.addIndex('places', ['patternId', 'userId'], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of [
    'places',
    'feedback',
    'invitations',
    'share_links',
    'versions',
    'patterns',
    'password_tokens',
    'access_tokens',
    'users',
  ]) {
    await qi.dropTable(table);
  }
}
