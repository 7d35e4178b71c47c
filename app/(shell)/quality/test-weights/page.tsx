import { requirePageUser } from '@/server/auth/authorize';
import { listTestWeights } from '@/server/services/calibration/test-weights';
import { TestWeightBoard } from './test-weight-board';

export const metadata = { title: 'Test weights' };

export default async function TestWeightsPage() {
  await requirePageUser('calibration.manage', '/quality/test-weights');
  const weights = await listTestWeights();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Test weights</h1>
        <p className="text-ink-soft">The reference weights used to test scales, with their class tolerance and when each certificate runs out.</p>
      </header>
      <TestWeightBoard initial={weights} />
    </div>
  );
}
