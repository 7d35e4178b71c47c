import 'server-only';
import { Op } from 'sequelize';
import { BuildOrder, type Kit } from '@/models';
import type { KitLabelData } from '@/labels/templates/kit-label';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import { inOrderOf } from './in-order-of';

// Kit labels are for build orders that have been released or completed: the kit code and revision,
// the order number and how many kits the order builds. Kits carry no GTIN yet, so the label uses the
// company-internal AIs (see labels/kit-element-strings.ts).
export async function loadKitLabels({ ids }: { ids: number[] }): Promise<KitLabelData[]> {
  getDb();
  const orders = (await BuildOrder.findAll({ where: { id: { [Op.in]: [...new Set(ids)] } }, include: [{ association: 'kit' }] })) as Array<
    BuildOrder & { kit: Kit }
  >;
  const found = inOrderOf(ids, orders, 'build order');
  const notReady = found.filter((o) => o.status === 'draft' || o.status === 'cancelled');
  if (notReady.length) {
    throw new AppError(
      'rule_violated',
      `Kit labels are for released or completed build orders; ${notReady.map((o) => `${o.number} is ${o.status}`).join(', ')}`,
      { fields: { ids: 'only released, in-progress or complete build orders' } },
    );
  }
  return found.map((o) => ({ kitCode: o.kit.code, revision: o.kit.revision, description: o.kit.description, orderNumber: o.number, quantity: o.quantity }));
}
