import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { PasswordToken } from '@/models';

export const TOKEN_LIFETIME_MS = 72 * 60 * 60 * 1000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

// A new one-time token replaces any earlier unused one for the same user.
export async function issuePasswordToken(userId: number, transaction: Transaction): Promise<{ token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + TOKEN_LIFETIME_MS);
  await PasswordToken.destroy({ where: { userId, usedAt: null }, transaction });
  await PasswordToken.create({ userId, tokenHash: hashToken(token), expiresAt, usedAt: null }, { transaction });
  return { token, expiresAt };
}
