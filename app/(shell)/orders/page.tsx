import { can } from '@/lib/roles';
import { siteDay } from '@/lib/time/site-clock';
import { requirePageUser } from '@/server/auth/authorize';
import { listOrdersSchema } from '@/server/schemas/orders';
import { listKits } from '@/server/services/kits/list-kits';
import { listOrders } from '@/server/services/orders/get-order';
import { siteTimeZone } from '@/server/services/settings/get-settings';
import { OrdersBoard } from './orders-board';

export const metadata = { title: 'Build orders' };

export default async function OrdersPage({ searchParams }: { searchParams: Promise<{ status?: string }> }) {
  const user = await requirePageUser('catalog.read', '/orders');
  const parsed = listOrdersSchema.safeParse(await searchParams);
  const status = parsed.success ? parsed.data.status : undefined;
  const canManage = can(user.role, 'orders.manage');
  const [orders, kits] = await Promise.all([listOrders({ status }), canManage ? listKits() : Promise.resolve([])]);
  const kitChoices = kits.filter((k) => k.active).map((k) => ({ id: k.id, label: `${k.code} rev ${k.revision} — ${k.description}`, components: k.components.length }));
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Build orders</h1>
        <p className="text-ink-soft">Kits to build: release them to reserve stock and send their lines to the bench, then follow them line by line.</p>
      </header>
      <OrdersBoard orders={orders} status={status ?? 'all'} kits={kitChoices} canManage={canManage} today={siteDay(await siteTimeZone())} />
    </div>
  );
}
