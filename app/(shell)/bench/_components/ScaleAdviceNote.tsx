import type { Advice } from '../_lib/scale-advice';

// What the bench says before the count about the scale chosen for it.
export function ScaleAdviceNote({ advice, target }: { advice: Advice; target: number | null }) {
  const { here, better } = advice;
  if (!here.problem) {
    if (target == null) return null;
    return (
      <p data-testid="scale-advice" data-ok="true" className="rounded-md bg-ok-light px-4 py-2 text-sm text-ok">
        This scale counts {target} pieces exactly from a sample of {here.sample}.
      </p>
    );
  }
  return (
    <p data-testid="scale-advice" data-ok="false" className="rounded-md bg-caution-light px-4 py-2 text-sm">
      {here.problem}
      {better
        ? ` ${better.scale.name} would serve: ${better.verdict.targetExact && target != null ? `it counts ${target} exactly from a sample of ${better.verdict.sample}` : 'it can count this part'}. Stop this count to change scale.`
        : ''}
    </p>
  );
}
