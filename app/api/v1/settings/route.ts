import { route } from '@/server/http/route';
import { updateSettingsSchema } from '@/lib/contracts/settings';
import { getSettings } from '@/server/services/settings/get-settings';
import { updateSettings } from '@/server/services/settings/update-settings';

export const GET = route({ access: 'signed-in' }, async () => ({ settings: await getSettings() }));

export const PATCH = route({ access: 'admin.manage', body: updateSettingsSchema }, async ({ body }) => ({
  settings: await updateSettings({ input: body }),
}));
