import { can } from '@/lib/roles';
import { firstValues, pageHref } from '@/lib/page-range';
import { siteDay } from '@/lib/time/site-clock';
import { requirePageUser } from '@/server/auth/authorize';
import { listOrdersSchema } from '@/lib/contracts/orders';
import { listKits } from '@/server/services/kits/list-kits';
import { listOrders } from '@/server/services/orders/list-orders';
import { siteTimeZone } from '@/server/services/settings/get-settings';
import { Pager } from '../../_components/pager';
import { OrdersBoard } from './orders-board';

export const metadata = { title: 'Build orders' };

export default async function OrdersPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('catalog.read', '/orders');
  const parsed = listOrdersSchema.safeParse(firstValues(await searchParams));
  // An address nobody could have made from the page's own links shows the first page of every order.
  const query = parsed.success ? parsed.data : listOrdersSchema.parse({});
  const canManage = can(user.role, 'orders.manage');
  const [list, kits] = await Promise.all([listOrders(query), canManage ? listKits() : Promise.resolve([])]);
  const kitChoices = kits
    .filter((k) => k.active)
    .map((k) => ({ id: k.id, label: `${k.code} rev ${k.revision} — ${k.description}`, components: k.components.length }));
  const filters = { status: query.status, q: query.q };
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Build orders</h1>
        <p className="text-ink-soft">Kits to build: release them to reserve stock and send their lines to the bench, then follow them line by line.</p>
      </header>
      <OrdersBoard list={list} status={query.status ?? 'all'} q={query.q ?? ''} kits={kitChoices} canManage={canManage} today={siteDay(await siteTimeZone())} />
      <Pager
        label="Pages of the build orders"
        at={list}
        shown={list.orders.length}
        hrefFor={(p) => pageHref('/orders', filters, p)}
        earlier="Newer"
        later="Older"
      />
    </div>
  );
}
