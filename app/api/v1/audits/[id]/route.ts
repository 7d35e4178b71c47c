import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { getAudit } from '@/server/services/audits/get-audit';

export const GET = route({ access: 'audits.run', params: idParamSchema }, async ({ params }) => ({ audit: await getAudit({ auditId: params.id }) }));
