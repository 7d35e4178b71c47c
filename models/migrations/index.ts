import * as m0001 from './0001-foundation';

// Ordered list of migrations. Add a file `NNNN-what-it-does.ts` exporting up/down and list it here.
export const migrations = [{ name: '0001-foundation', ...m0001 }];
