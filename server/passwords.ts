/** Password hashing and the single-use links for resets and invitations. */
import bcrypt from 'bcryptjs';
import { Op } from 'sequelize';
import type { Models } from './models/index.js';
import type { UserInstance } from './models/user.js';
import { hashToken, looksLikeToken, newToken, tokenMatches } from './security.js';

const COST = 10;
/** Reset and invitation links live under an hour, as the issue asks. */
export const LINK_MINUTES = 50;

export const hashPassword = (password: string): Promise<string> => bcrypt.hash(password, COST);

// Compared against when the address is unknown, so sign-in takes as long either way.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', COST);

export async function verifyPassword(user: UserInstance | null, password: string): Promise<boolean> {
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
  return ok && Boolean(user?.passwordHash);
}

export async function issuePasswordLink(
  models: Models,
  user: UserInstance,
  purpose: 'reset' | 'invite',
  publicUrl: string,
): Promise<string> {
  const token = newToken();
  await models.PasswordToken.create({
    userId: user.id,
    purpose,
    tokenHash: hashToken(token),
    expiresAt: new Date(Date.now() + LINK_MINUTES * 60_000),
  });
  return `${publicUrl}/reset?token=${token}${purpose === 'invite' ? '&invite=1' : ''}`;
}

/** Uses up a link and sets the password; null when the link is unknown, used or expired. */
export async function redeemPasswordLink(
  models: Models,
  token: string,
  password: string,
): Promise<UserInstance | null> {
  if (!looksLikeToken(token)) return null;
  const row = await models.PasswordToken.findOne({
    where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
  });
  if (!row || !tokenMatches(token, row.tokenHash)) return null;
  const user = await models.User.findByPk(row.userId);
  if (!user) return null;
  const passwordHash = await hashPassword(password);
  // Conditional update so two uses of one link in parallel cannot both succeed.
  const [claimed] = await models.PasswordToken.update({ usedAt: new Date() }, { where: { id: row.id, usedAt: null } });
  if (claimed !== 1) return null;
  await user.update({ passwordHash });
  return user;
}
