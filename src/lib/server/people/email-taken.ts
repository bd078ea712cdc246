import type { Transaction } from 'sequelize';
import { User } from '../models';

export const EMAIL_TAKEN = 'This e-mail already has a Beadline account.';

/**
 * E-mail addresses are unique across every shop (one person, one account, one shop), so this is
 * the one lookup that is deliberately not scoped by shop. It answers yes or no, nothing more.
 */
export async function emailTaken(email: string, t: Transaction): Promise<boolean> {
	return (await User.count({ where: { email }, transaction: t })) > 0;
}
