import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

// The project's own ESLint config, run on imports written for the check: each seam of DEVELOPERS.md's
// folder table refuses what crosses it and lets through what it allows.
const eslint = new ESLint({ cwd: process.cwd() });

async function rulesHit(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result.messages.map((m) => m.ruleId ?? m.message);
}

const uses = (name: string) => `export { ${name} };\n`;

describe('import boundaries (eslint.config.mjs)', () => {
  it.each([
    ['lib/weighing/new-rule.ts', "import { getDb } from '@/server/db';\n" + uses('getDb')],
    ['lib/weighing/new-rule.ts', "import { Part } from '../../models';\n" + uses('Part')],
    ['lib/new-words.ts', "import { LABEL_STOCKS } from '../labels/stocks';\n" + uses('LABEL_STOCKS')],
    ['lib/new-words.ts', "import { Op } from 'sequelize';\n" + uses('Op')],
    ['models/new-model.ts', "import { route } from '@/server/http/route';\n" + uses('route')],
    ['labels/new-template.ts', "import { Part } from '../models';\n" + uses('Part')],
    ['server/services/new-service.ts', "import { Pager } from '@/app/_components/pager';\n" + uses('Pager')],
    ['models/migrations/0099-new.ts', "import { ORDER_STATUSES } from '../../lib/domain/orders';\n" + uses('ORDER_STATUSES')],
  ])('%s may not: %s', async (file, code) => {
    expect(await rulesHit(file, code)).toContain('no-restricted-imports');
  });

  it('refuses a run-time import of server code in a client component, and allows its types', async () => {
    const client = "'use client';\n";
    expect(await rulesHit('app/(shell)/new-panel.tsx', client + "import { getDb } from '@/server/db';\n" + uses('getDb'))).toContain(
      'tallyforge/client-boundary',
    );
    expect(await rulesHit('app/(shell)/new-panel.tsx', client + "import type { Part } from '@/models';\nexport type P = Part;\n")).toEqual([]);
    // The same import in a server component is fine.
    expect(await rulesHit('app/(shell)/new-page.tsx', "import { getDb } from '@/server/db';\n" + uses('getDb'))).toEqual([]);
  });

  it('lets each folder use what the table allows', async () => {
    expect(await rulesHit('lib/new-words.ts', "import { ORDER_STATUSES } from './domain/orders';\n" + uses('ORDER_STATUSES'))).toEqual([]);
    expect(await rulesHit('models/new-model.ts', "import { ORDER_STATUSES } from '../lib/domain/orders';\n" + uses('ORDER_STATUSES'))).toEqual([]);
    expect(await rulesHit('server/services/new-service.ts', "import { Part } from '@/models';\n" + uses('Part'))).toEqual([]);
    expect(await rulesHit('models/migrations/0099-new.ts', "import { DataTypes } from 'sequelize';\n" + uses('DataTypes'))).toEqual([]);
  });
});
