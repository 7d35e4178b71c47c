import { created, route } from '@/server/http/route';
import { createAuditSchema } from '@/lib/contracts/audits';
import { createAudit } from '@/server/services/audits/create-audit';
import { listAudits } from '@/server/services/audits/get-audit';

export const GET = route({ access: 'audits.run' }, async () => ({ audits: await listAudits() }));

export const POST = route({ access: 'audits.run', body: createAuditSchema }, async ({ body, user }) =>
  created({ audit: await createAudit({ input: body, by: user }) }),
);
