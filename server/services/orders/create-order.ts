import 'server-only';
import { randomBytes } from 'node:crypto';
import { BuildOrder, BuildOrderLine, Kit, KitComponent } from '@/models';
import { siteYear } from '@/lib/time/site-clock';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { CreateOrderInput, OrderDto } from '@/lib/contracts/orders';
import { siteTimeZone } from '../settings/get-settings';
import { oncePerKey } from '../requests/once-per-key';
import { getOrder } from './get-order';

// A draft order copies the kit revision's bill of material, scaled by the number of kits.
// A double submit with the same Idempotency-Key makes one order.
export async function createOrder({
  input,
  by,
  idempotencyKey,
}: {
  input: CreateOrderInput;
  by: SessionUser;
  idempotencyKey?: string;
}): Promise<{ order: OrderDto; replayed: boolean }> {
  getDb();
  const timeZone = await siteTimeZone();
  const { id, replayed } = await oncePerKey({ key: idempotencyKey, userId: by.id, scope: 'orders.create', input }, async (transaction) => {
    const kit = await Kit.findByPk(input.kitId, { transaction });
    if (!kit) throw new AppError('not_found', 'Kit was not found', { fields: { kitId: 'no such kit' } });
    if (!kit.active) throw new AppError('rule_violated', `Kit ${kit.code} revision ${kit.revision} is retired`, { fields: { kitId: 'retired revision' } });
    const components = await KitComponent.findAll({ where: { kitId: kit.id }, transaction });
    const order = await BuildOrder.create(
      {
        number: `T${randomBytes(8).toString('hex')}`,
        kitId: kit.id,
        quantity: input.quantity,
        dueDate: input.dueDate ?? null,
        createdBy: by.id,
        releasedAt: null,
        completedAt: null,
        cancelledAt: null,
        overrideReason: null,
      },
      { transaction },
    );
    // The readable number comes from the row id, so two planners never get the same one.
    order.number = `BO-${siteYear(timeZone)}-${String(order.id).padStart(5, '0')}`;
    await order.save({ transaction });
    await BuildOrderLine.bulkCreate(
      components.map((c) => ({
        orderId: order.id,
        partId: c.partId,
        quantityPerKit: c.quantity,
        required: c.quantity * input.quantity,
        toleranceBelow: c.toleranceBelow * input.quantity,
        toleranceAbove: c.toleranceAbove * input.quantity,
      })),
      { transaction },
    );
    return order.id;
  });
  return { order: await getOrder({ orderId: id }), replayed };
}
