import { VERDICT_STYLE, VERDICT_WORDS } from '@/lib/order-words';
import type { OrderLineDto } from '@/server/schemas/orders';

// U is the expanded uncertainty (95 %) of the counted quantity, summed over the line's captures.
export function OrderLines({ lines }: { lines: OrderLineDto[] }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm md:text-base" data-testid="order-lines">
        <caption className="sr-only">Lines of the order</caption>
        <thead>
          <tr className="text-left border-b border-paper-line text-ink-soft">
            <th scope="col" className="py-2 pr-3">Part</th>
            <th scope="col" className="py-2 pr-3 text-right">Required <span className="block text-xs font-normal">allowed −/+</span></th>
            <th scope="col" className="py-2 pr-3 text-right">Counted <span className="block text-xs font-normal">± U (95 %)</span></th>
            <th scope="col" className="py-2">Verdict</th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l) => (
            <tr key={l.id} className="border-b border-paper-line" data-testid={`line-${l.partNumber}`}>
              <td className="py-2 pr-3">
                <span className="num font-medium whitespace-nowrap">{l.partNumber}</span>
                <span className="block text-ink-faint text-sm">{l.description} · {l.quantityPerKit} per kit</span>
              </td>
              <td className="py-2 pr-3 text-right num whitespace-nowrap">
                {l.required}
                <span className="block text-sm text-ink-faint">−{l.toleranceBelow} / +{l.toleranceAbove}</span>
              </td>
              <td className="py-2 pr-3 text-right num whitespace-nowrap">
                {l.captures ? l.counted : '—'}
                <span className="block text-sm text-ink-faint">{l.captures ? (l.wholePieceRange === 0 ? 'exact' : `± ${l.wholePieceRange}`) : 'not counted yet'}</span>
              </td>
              <td className="py-2">
                <span className={`inline-block rounded px-2 py-1 text-sm whitespace-nowrap ${VERDICT_STYLE[l.verdict]}`}>{VERDICT_WORDS[l.verdict]}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
