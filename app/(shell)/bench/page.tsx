import { requirePageUser } from '@/server/auth/authorize';
import { listContainers } from '@/server/services/containers/list-containers';
import { listScales } from '@/server/services/scales/list-scales';
import { getSettings } from '@/server/services/settings/get-settings';
import { BenchStation } from './_components/BenchStation';
import { BenchTabGuard } from './_components/BenchTabGuard';

export const metadata = { title: 'Bench' };

export default async function BenchPage({ searchParams }: { searchParams: Promise<{ bin?: string }> }) {
  await requirePageUser('counts.capture', '/bench');
  const { bin } = await searchParams;
  const [scales, containers, settings] = await Promise.all([listScales(), listContainers(), getSettings()]);
  return (
    <BenchTabGuard>
      <BenchStation
        scales={scales}
        containers={containers}
        stabilityWindowMs={settings.stabilityWindowMs}
        defaultPieceSpread={settings.defaultPieceSpread}
        blindCycleCounts={settings.blindCycleCounts}
        initialBin={bin ?? null}
      />
    </BenchTabGuard>
  );
}
