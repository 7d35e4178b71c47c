import 'server-only';
import { Part, PieceWeightSample, Scale, User } from '@/models';
import { getDb } from '../../db';
import type { HeldSample } from '@/lib/contracts/parts';

// Samples far from their part's history, oldest first: what a planner or quality engineer decides.
export async function listHeldSamples(): Promise<HeldSample[]> {
  getDb();
  const rows = await PieceWeightSample.findAll({ where: { status: 'held' }, order: [['id', 'ASC']], limit: 200 });
  if (rows.length === 0) return [];
  const [parts, scales, users] = await Promise.all([
    Part.findAll({ where: { id: [...new Set(rows.map((r) => r.partId))] } }),
    Scale.findAll({ where: { id: [...new Set(rows.map((r) => r.scaleId))] } }),
    User.findAll({ where: { id: [...new Set(rows.map((r) => r.createdBy))] } }),
  ]);
  const part = new Map(parts.map((p) => [p.id, p]));
  const scale = new Map(scales.map((s) => [s.id, s.name]));
  const user = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    partId: r.partId,
    partNumber: part.get(r.partId)?.partNumber ?? '',
    partApw: part.get(r.partId)?.apwG == null ? null : Number(part.get(r.partId)!.apwG),
    quantity: r.quantity,
    averagePieceWeight: Number(r.apwG),
    holdReason: r.holdReason ?? '',
    scaleName: scale.get(r.scaleId) ?? '',
    takenBy: user.get(r.createdBy) ?? '',
    takenAt: r.createdAt.toISOString(),
  }));
}
