// A kit of one stocked part and a build order for it, released unless told otherwise, made through the API.
import { expect } from 'vitest';
import { createPart, stockPart, unique } from './db';
import type { Agent } from './http';

export async function releasedOrder(agent: Agent, { quantity = 12, status = 'released' }: { quantity?: number; status?: 'released' | 'draft' } = {}) {
  const part = await createPart();
  await stockPart(part.id, 10_000);
  const kit = await agent
    .post('/api/v1/kits')
    .send({ code: unique('KIT').toUpperCase(), revision: 'C', description: 'Gearbox fastener kit', components: [{ partId: part.id, quantity: 4 }] });
  expect(kit.status).toBe(201);
  const order = await agent.post('/api/v1/orders').send({ kitId: kit.body.kit.id, quantity });
  expect(order.status).toBe(201);
  if (status === 'released')
    expect((await agent.post(`/api/v1/orders/${order.body.order.id}/release`).send({ version: order.body.order.version })).status).toBe(200);
  return { kit: kit.body.kit, order: order.body.order };
}
