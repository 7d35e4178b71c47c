import { describe, expect, it } from 'vitest';
import { pagePermission } from './page-access';

describe('pagePermission', () => {
  it.each([
    ['/', undefined],
    ['/bench', 'counts.capture'],
    ['/orders/17', 'catalog.read'],
    ['/bins/variances', 'catalog.read'],
    ['/labels', 'labels.print'],
    ['/quality/audits/4', 'audits.run'],
    ['/quality/test-weights', 'calibration.manage'],
    ['/admin/users', 'admin.manage'],
    ['/benchmark', undefined], // a prefix of a word is not a page below it
    ['/forbidden', undefined],
  ])('%s needs %s', (path, permission) => {
    expect(pagePermission(path)).toBe(permission);
  });
});
