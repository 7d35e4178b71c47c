import { LABEL_STOCKS, STOCK_IDS } from '@/labels/stocks';
import { KIT_LABEL_STOCKS } from '@/lib/domain/labels';
import { requirePageUser } from '@/server/auth/authorize';
import { listBins } from '@/server/services/bins/list-bins';
import { listOrders } from '@/server/services/orders/list-orders';
import { listParts } from '@/server/services/parts/list-parts';
import { listPrintJobs } from '@/server/services/print-jobs/list-print-jobs';
import { LabelDesk } from './label-desk';

export const metadata = { title: 'Labels' };

export default async function LabelsPage() {
  await requirePageUser('labels.print', '/labels');
  const [bins, parts, orders, jobs] = await Promise.all([
    listBins({ page: 1, pageSize: 500 }),
    listParts({ page: 1, pageSize: 500, sort: 'partNumber', dir: 'asc' }),
    listOrders({ page: 1, pageSize: 500 }),
    listPrintJobs({ limit: 50 }),
  ]);
  const stocks = STOCK_IDS.map((id) => ({ id, name: LABEL_STOCKS[id].name, kit: KIT_LABEL_STOCKS.includes(id) }));
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Labels</h1>
        <p className="text-ink-soft">
          Barcoded labels for bins, parts and finished kits, rendered on the server: download a PDF or send it to the label printer.
        </p>
      </header>
      <LabelDesk
        bins={bins.bins.map((b) => ({ id: b.id, code: b.code, partNumber: b.partNumber, bookQuantity: b.bookQuantity }))}
        parts={parts.parts.map((p) => ({ id: p.id, partNumber: p.partNumber, description: p.description }))}
        orders={orders.orders
          .filter((o) => o.status !== 'draft' && o.status !== 'cancelled')
          .map((o) => ({ id: o.id, number: o.number, kit: `${o.kitCode} rev ${o.kitRevision}`, quantity: o.quantity, status: o.status }))}
        stocks={stocks}
        jobs={jobs}
      />
    </div>
  );
}
