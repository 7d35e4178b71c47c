import { requirePageUser } from '@/server/auth/authorize';
import { getSettings } from '@/server/services/settings/get-settings';
import { serverTimeZone } from '@/server/services/settings/server-time-zone';
import { SettingsForm } from './settings-form';

export const metadata = { title: 'Site settings' };

export default async function SettingsPage() {
  await requirePageUser('admin.manage', '/admin/settings');
  const settings = await getSettings();
  return (
    <div className="space-y-6 max-w-2xl">
      <header>
        <h1 className="page-title">Site settings</h1>
        <p className="text-ink-soft">Defaults for the whole shop. Parts that have learned their own piece spread use that instead.</p>
      </header>
      <SettingsForm initial={settings} zones={Intl.supportedValuesOf('timeZone')} serverZone={serverTimeZone()} />
    </div>
  );
}
