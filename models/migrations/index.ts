import * as m0001 from './0001-foundation';
import * as m0002 from './0002-counting-core';
import * as m0003 from './0003-kits-orders-stock';
import * as m0004 from './0004-quality';
import * as m0005 from './0005-bin-counts';
import * as m0006 from './0006-print-jobs';
import * as m0007 from './0007-exact-counts';
import * as m0008 from './0008-site-time-zone';
import * as m0009 from './0009-user-sessions';
import * as m0010 from './0010-mask-mail-links';
import * as m0011 from './0011-request-keys';
import * as m0012 from './0012-print-job-notes';

// Ordered list of migrations. Add a file `NNNN-what-it-does.ts` exporting up/down and list it here.
export const migrations = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-counting-core', ...m0002 },
  { name: '0003-kits-orders-stock', ...m0003 },
  { name: '0004-quality', ...m0004 },
  { name: '0005-bin-counts', ...m0005 },
  { name: '0006-print-jobs', ...m0006 },
  { name: '0007-exact-counts', ...m0007 },
  { name: '0008-site-time-zone', ...m0008 },
  { name: '0009-user-sessions', ...m0009 },
  { name: '0010-mask-mail-links', ...m0010 },
  { name: '0011-request-keys', ...m0011 },
  { name: '0012-print-job-notes', ...m0012 },
];
