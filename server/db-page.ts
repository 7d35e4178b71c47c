import 'server-only';
import type { FindOptions, IncludeOptions, Model, ModelStatic, Order, WhereOptions } from 'sequelize';
import type { PageOf } from '@/lib/page-range';

interface PageQuery<M extends Model> {
  where?: WhereOptions<M>;
  /** Associations the rows come with. */
  include?: IncludeOptions[];
  /** Associations whose columns the filter names ('$part.part_number$'): joined to find the page. */
  filterJoins?: IncludeOptions[];
  order: Order;
  page: number;
  pageSize: number;
}

// One page of a model's rows and the list's total. The page is found in two steps: its ids first, ordered
// and cut from an index alone, then those rows by primary key. Asked for whole rows ORDER BY an indexed
// column with LIMIT, MariaDB 10.11 reads and sorts the whole table instead (measured: 7.8 ms against
// 0.8 ms for the ids on 10,000 parts), and a deep page would read every row it skips.
export async function pageOfRows<M extends Model & { id: number }>(model: ModelStatic<M>, query: PageQuery<M>): Promise<PageOf & { rows: M[] }> {
  const { where, include, filterJoins, order, page, pageSize } = query;
  const joins = filterJoins?.map((i) => ({ ...i, attributes: [] }));
  const [ids, total] = await Promise.all([
    model.findAll({
      attributes: ['id'],
      where,
      include: joins,
      order,
      limit: pageSize,
      offset: (page - 1) * pageSize,
      raw: true,
    } as FindOptions) as unknown as Promise<Array<{ id: number }>>,
    model.count({ where, include: joins } as FindOptions),
  ]);
  const found = ids.length ? await model.findAll({ where: { id: ids.map((r) => r.id) } as WhereOptions, include } as FindOptions) : [];
  const byId = new Map(found.map((row) => [row.id, row]));
  return { rows: ids.map((r) => byId.get(r.id)).filter((row): row is M => row !== undefined), total, page, pageSize };
}
