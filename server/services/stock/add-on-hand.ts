import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../db';

// Keeps part_stock.on_hand equal to the sum of the part's bins, in the caller's transaction.
export async function addOnHand(partId: number, delta: number, transaction: Transaction): Promise<void> {
  await getDb().query(
    `INSERT INTO part_stock (part_id, on_hand, reserved) VALUES (:partId, :delta, 0)
     ON DUPLICATE KEY UPDATE on_hand = on_hand + VALUES(on_hand)`,
    { replacements: { partId, delta }, transaction },
  );
}
