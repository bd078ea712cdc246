// A joint's round: 0 while it is first welded, then the number of its latest repair. Passes are
// unique per joint, round and pass, so a repaired joint is welded again under its repair.
import type { Transaction } from 'sequelize';
import { JointRepair } from '../models';

export async function currentRound(jointId: number, t?: Transaction): Promise<number> {
	const latest = await JointRepair.max('round', { where: { jointId }, transaction: t });
	return typeof latest === 'number' ? latest : 0;
}
