import 'server-only';
import type { AvailabilityLine, OrderDto } from '@/lib/contracts/orders';

export function releaseMail(order: OrderDto, by: string): { kind: string; subject: string; text: string } {
  return {
    kind: 'order_released',
    subject: `Ready to kit: ${order.number} — ${order.quantity} × ${order.kitCode} rev ${order.kitRevision}`,
    text: [
      `${by} released ${order.number}: ${order.quantity} kits of ${order.kitCode} rev ${order.kitRevision} (${order.kitDescription}).`,
      order.dueDate ? `Due ${order.dueDate}.` : 'No due date set.',
      '',
      'Lines to count:',
      ...order.lines.map((l) => `  ${l.partNumber.padEnd(18)} ${String(l.required).padStart(7)} pcs  (${l.description})`),
      '',
      'The lines are waiting in the kitting queue at the bench.',
    ].join('\n'),
  };
}

export function shortageMail(number: string, shortages: AvailabilityLine[]): { kind: string; subject: string; text: string } {
  return {
    kind: 'order_shortage',
    subject: `Short of stock: ${number} could not be released`,
    text: [
      `${number} could not be released because these parts are short:`,
      '',
      ...shortages.map(
        (s) =>
          `  ${s.partNumber.padEnd(18)} needs ${s.required}, available ${s.available} (on hand ${s.onHand}, held by other orders ${s.reserved}) — short by ${s.shortage}`,
      ),
      '',
      'Nothing was reserved. Release it again once stock has arrived or other orders are done.',
    ].join('\n'),
  };
}
