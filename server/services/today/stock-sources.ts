import 'server-only';
import { BinCount } from '@/models';
import { can } from '@/lib/roles';
import { binsDue } from '../bins/bins-due';
import type { WaitingSource } from './waiting-item';

export const STOCK_SOURCES: WaitingSource[] = [
  async ({ role }) => {
    if (!can(role, 'bins.edit')) return null;
    const count = (await binsDue()).length;
    return { key: 'bins-due', title: 'Bins due for a cycle count', count, detail: 'By ABC class; never-counted bins first', href: '/bins' };
  },
  async ({ id, role }) => {
    if (role !== 'clerk') return null;
    const count = await BinCount.count({ where: { status: 'pending' }, include: [{ association: 'event', attributes: [], where: { operatorId: id } }] });
    return {
      key: 'variances-raised',
      title: 'Your variances awaiting approval',
      count,
      detail: 'Counts of yours beyond the site limits',
      href: '/bins/variances',
    };
  },
  async ({ role }) => {
    if (!can(role, 'variances.approve')) return null;
    const count = await BinCount.count({ where: { status: 'pending' } });
    return { key: 'variances-pending', title: 'Variances to approve or reject', count, detail: 'Bin counts beyond the site limits', href: '/bins/variances' };
  },
];
